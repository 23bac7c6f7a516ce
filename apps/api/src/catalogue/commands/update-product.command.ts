import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { UpdateProductDto } from '../dto/update-product.dto.js';
import type { ProductView } from '../dto/product.view.js';

export class UpdateProductCommand extends Command<ProductView> {
  constructor(
    readonly user: AuthUser,
    readonly productId: string,
    readonly changes: UpdateProductDto,
  ) {
    super();
  }
}
