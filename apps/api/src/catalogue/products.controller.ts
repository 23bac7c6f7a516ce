import { Body, Controller, Get, HttpCode, Param, Patch, Post, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { CommandBus, QueryBus } from '@nestjs/cqrs';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/current-user.decorator.js';
import { CheckPolicies } from '../authz/check-policies.decorator.js';
import { ParseId } from '../common/parse-id.pipe.js';
import type { UploadedSpreadsheet } from '../common/spreadsheet-reader.js';
import { CreateProductCommand } from './commands/create-product.command.js';
import { ImportProductsCommand } from './commands/import-products.command.js';
import { UpdateProductCommand } from './commands/update-product.command.js';
import { CreateProductDto } from './dto/create-product.dto.js';
import { ImportOptionsDto } from './dto/import-options.dto.js';
import { ImportResultView } from './dto/import-result.view.js';
import { ListProductsDto } from './dto/list-products.dto.js';
import { ProductView } from './dto/product.view.js';
import { UpdateProductDto } from './dto/update-product.dto.js';
import { GetProductQuery } from './queries/get-product.query.js';
import { ListProductsQuery } from './queries/list-products.query.js';
import { SpreadsheetUploadInterceptor } from '../common/spreadsheet-upload.interceptor.js';
import { SpreadsheetUploadDocs } from './upload-docs.js';

@ApiTags('catalogue')
@ApiBearerAuth()
@Controller('catalogue/products')
export class ProductsController {
  constructor(
    private readonly commands: CommandBus,
    private readonly queries: QueryBus,
  ) {}

  /** The product catalogue by kind and name, each with its derived cost per gram. */
  @Get()
  @CheckPolicies('read', 'Catalogue')
  list(@CurrentUser() user: AuthUser, @Query() filter: ListProductsDto): Promise<ProductView[]> {
    return this.queries.execute(new ListProductsQuery(user, filter));
  }

  @Get(':id')
  @CheckPolicies('read', 'Catalogue')
  get(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string): Promise<ProductView> {
    return this.queries.execute(new GetProductQuery(user, id));
  }

  @Post()
  @CheckPolicies('create', 'Catalogue')
  create(@CurrentUser() user: AuthUser, @Body() body: CreateProductDto): Promise<ProductView> {
    return this.commands.execute(new CreateProductCommand(user, body));
  }

  /** Change a product; its cost per gram is derived again from the container. */
  @Patch(':id')
  @CheckPolicies('update', 'Catalogue')
  update(@CurrentUser() user: AuthUser, @Param('id', ParseId()) id: string, @Body() body: UpdateProductDto): Promise<ProductView> {
    return this.commands.execute(new UpdateProductCommand(user, id, body));
  }

  @Post('import')
  @HttpCode(200)
  @CheckPolicies('create', 'Catalogue')
  @UseInterceptors(SpreadsheetUploadInterceptor)
  @SpreadsheetUploadDocs('Preview or commit a product catalogue spreadsheet', [
    'One row per product, matched to the catalogue by `code`: a new code creates a product, a known one updates it.',
    'Headings: `code`, `name`, `kind` (permanent, demi_permanent, lightener, developer, treatment, retail), `container_size`, `container_unit` (g, oz, mL, fl oz), `container_cost` are required; `developer_volume` (developers only, 0–40), `density_g_per_ml`, `retail_price` (required for retail) are optional.',
    'An optional column left out of the file keeps each existing product’s value; an empty cell clears it. The cost per gram is derived, never read from the file.',
  ])
  import(@CurrentUser() user: AuthUser, @UploadedFile() file: UploadedSpreadsheet | undefined, @Query() options: ImportOptionsDto): Promise<ImportResultView> {
    return this.commands.execute(new ImportProductsCommand(user, file, options.commit ?? false));
  }
}
