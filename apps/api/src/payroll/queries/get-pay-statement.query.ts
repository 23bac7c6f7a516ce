import { Query } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ExportedFile } from '../commands/export-payroll-run.command.js';

export class GetPayStatementQuery extends Query<ExportedFile> {
  constructor(
    readonly user: AuthUser,
    readonly runId: string,
    readonly lineId: string,
  ) {
    super();
  }
}
