import { Module } from '@nestjs/common';
import { CreateLevelHandler } from './commands/create-level.handler.js';
import { CreateProductHandler } from './commands/create-product.handler.js';
import { CreateServiceHandler } from './commands/create-service.handler.js';
import { ImportProductsHandler } from './commands/import-products.handler.js';
import { ImportServicesHandler } from './commands/import-services.handler.js';
import { UpdateLevelHandler } from './commands/update-level.handler.js';
import { UpdateProductHandler } from './commands/update-product.handler.js';
import { UpdateServiceHandler } from './commands/update-service.handler.js';
import { LevelsController } from './levels.controller.js';
import { LevelsRepository } from './levels.repository.js';
import { ProductsController } from './products.controller.js';
import { ProductsRepository } from './products.repository.js';
import { GetProductHandler } from './queries/get-product.handler.js';
import { GetServiceHandler } from './queries/get-service.handler.js';
import { ListLevelsHandler } from './queries/list-levels.handler.js';
import { ListProductsHandler } from './queries/list-products.handler.js';
import { ListServicesHandler } from './queries/list-services.handler.js';
import { ServicesController } from './services.controller.js';
import { ServicesRepository } from './services.repository.js';

@Module({
  controllers: [LevelsController, ServicesController, ProductsController],
  providers: [
    LevelsRepository,
    ServicesRepository,
    ProductsRepository,
    CreateLevelHandler,
    UpdateLevelHandler,
    CreateServiceHandler,
    UpdateServiceHandler,
    CreateProductHandler,
    UpdateProductHandler,
    ImportProductsHandler,
    ImportServicesHandler,
    ListLevelsHandler,
    ListServicesHandler,
    GetServiceHandler,
    ListProductsHandler,
    GetProductHandler,
  ],
})
export class CatalogueModule {}
