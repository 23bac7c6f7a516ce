import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ExportedFile } from '../compare-workbook.js';

export class GetFeeStatementWorkbookQuery extends Query<ExportedFile> {
  constructor(
    readonly user: AuthUser,
    readonly branchId: string,
    readonly month: string,
  ) {
    super();
  }
}
