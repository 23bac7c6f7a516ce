import { Command } from '@nestjs/cqrs';
import type { Readable } from 'node:stream';
import type { AuthUser } from '../../auth/auth-user.js';

/** A file to send: small ones in memory, large ones as a stream of known length. */
export type ExportedFile = { fileName: string; contentType: string } & ({ body: Buffer } | { body: Readable; length: number });

export class ExportPayrollRunCommand extends Command<ExportedFile> {
  constructor(
    readonly user: AuthUser,
    readonly runId: string,
    readonly format: 'xlsx' | 'csv',
  ) {
    super();
  }
}
