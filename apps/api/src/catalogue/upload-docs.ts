import { applyDecorators } from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiOperation } from '@nestjs/swagger';
import { SPREADSHEET_MAX_BYTES, SPREADSHEET_MAX_ROWS } from '../common/spreadsheet-reader.js';

const COMMON = [
  `Multipart field \`file\`: a .csv (UTF-8) or .xlsx file of at most ${SPREADSHEET_MAX_BYTES / 1024 / 1024} MB (413 beyond) and ${SPREADSHEET_MAX_ROWS} rows; other types are a 400 naming \`file\`.`,
  'Row 1 holds the headings (any case; spaces may stand for underscores). Cells are read as typed: nothing is evaluated, and an .xlsx formula cell is read as its formula text, which no number column accepts.',
  'Without `commit=true` nothing is written: the answer previews every row (its number as the spreadsheet shows it, its cells, its errors by column, and whether it creates, updates or leaves a record unchanged).',
  'With `commit=true` every row is written in one transaction, with one created/updated event per record, or, if any row is bad, nothing is written and the answer is a 400 whose `details` list each bad cell as `{ row, field, message }`.',
];

/** OpenAPI description of an upload route: the multipart body and the columns of its file. */
export const SpreadsheetUploadDocs = (summary: string, columns: string[]) =>
  applyDecorators(
    ApiOperation({ summary, description: [...columns, ...COMMON].join('\n\n') }),
    ApiConsumes('multipart/form-data'),
    ApiBody({ schema: { type: 'object', required: ['file'], properties: { file: { type: 'string', format: 'binary' } } } }),
  );
