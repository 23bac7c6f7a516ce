import { BadRequestException, type CallHandler, type ExecutionContext, Injectable, type NestInterceptor } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { SPREADSHEET_MAX_BYTES } from './spreadsheet-reader.js';
import { ValidationFailedError } from './validation-failed.error.js';

// multer keeps the file in memory (no `dest`): nothing is left on disk, and 2 MB is small.
const MulterSingleFile = FileInterceptor('file', { limits: { fileSize: SPREADSHEET_MAX_BYTES, files: 1, fields: 5 } });

/**
 * Receives one spreadsheet in the multipart field "file". Past the size limit multer answers 413;
 * its other refusals (another field name, a second file) become a 400 naming "file".
 */
@Injectable()
export class SpreadsheetUploadInterceptor implements NestInterceptor {
  private readonly multer = new MulterSingleFile();

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await this.multer.intercept(context, next);
    } catch (error) {
      if (error instanceof BadRequestException) {
        throw new ValidationFailedError([{ field: 'file', message: 'Send one .csv or .xlsx file in the multipart field "file".' }]);
      }
      throw error;
    }
  }
}
