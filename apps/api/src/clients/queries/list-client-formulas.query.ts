import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { FormulaPageView } from '../dto/formula.view.js';
import type { PageQueryDto } from '../../common/page-query.dto.js';

export class ListClientFormulasQuery extends Query<FormulaPageView> {
  constructor(
    readonly user: AuthUser,
    readonly clientId: string,
    readonly page: PageQueryDto,
  ) {
    super();
  }
}
