import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ProductView } from '../dto/product.view.js';

export class GetProductQuery extends Query<ProductView> {
  constructor(
    readonly user: AuthUser,
    readonly productId: string,
  ) {
    super();
  }
}
