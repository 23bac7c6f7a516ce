import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { UploadedSpreadsheet } from '../../common/spreadsheet-reader.js';
import type { ImportResultView } from '../dto/import-result.view.js';

export class ImportProductsCommand extends Command<ImportResultView> {
  constructor(
    readonly user: AuthUser,
    readonly file: UploadedSpreadsheet | undefined,
    readonly commit: boolean,
  ) {
    super();
  }
}
