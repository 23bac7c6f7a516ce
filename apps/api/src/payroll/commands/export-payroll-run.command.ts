import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';

export type ExportedFile = { fileName: string; contentType: string; body: Buffer };

export class ExportPayrollRunCommand extends Command<ExportedFile> {
  constructor(
    readonly user: AuthUser,
    readonly runId: string,
    readonly format: 'xlsx' | 'csv',
  ) {
    super();
  }
}
