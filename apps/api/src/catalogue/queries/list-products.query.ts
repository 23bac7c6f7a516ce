import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ListProductsDto } from '../dto/list-products.dto.js';
import type { ProductView } from '../dto/product.view.js';

export class ListProductsQuery extends Query<ProductView[]> {
  constructor(
    readonly user: AuthUser,
    readonly filter: ListProductsDto,
  ) {
    super();
  }
}
