import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { CreateProductDto } from '../dto/create-product.dto.js';
import type { ProductView } from '../dto/product.view.js';

export class CreateProductCommand extends Command<ProductView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CreateProductDto,
  ) {
    super();
  }
}
