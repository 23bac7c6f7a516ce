import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ExportedFile } from '../compare-workbook.js';

export class GetComparisonWorkbookQuery extends Query<ExportedFile> {
  constructor(
    readonly user: AuthUser,
    readonly from: string,
    readonly to: string,
    readonly rebookingDays: number,
  ) {
    super();
  }
}
