import { Readable } from 'node:stream';
import { DomainError } from '@tressury/domain';
import Big from 'big.js';
import ExcelJS from 'exceljs';

/** The largest upload accepted; multer stops reading past it (413). */
export const SPREADSHEET_MAX_BYTES = 2 * 1024 * 1024;
/** Data rows per file: a catalogue or menu is hundreds of rows; the bound keeps one import's transaction short. */
export const SPREADSHEET_MAX_ROWS = 2000;

/** What multer's memory storage hands over for one uploaded file. */
export type UploadedSpreadsheet = { originalname: string; mimetype: string; size: number; buffer: Buffer };

/** One data row: its number as the spreadsheet shows it (the header is row 1) and its cells as text, by column. */
export type SheetRow = { row: number; cells: string[] };
export type Sheet = { fileName: string; headers: string[]; rows: SheetRow[] };

type Format = 'csv' | 'xlsx';

// Browsers and operating systems label CSV in many ways (Windows says application/vnd.ms-excel);
// a generic binary type is accepted only because the content is checked below as well.
const MIME_TYPES: Record<Format, string[]> = {
  csv: ['text/csv', 'application/csv', 'text/x-csv', 'text/comma-separated-values', 'text/plain', 'application/vnd.ms-excel', 'application/octet-stream'],
  xlsx: ['application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', 'application/zip', 'application/octet-stream'],
};

const ZIP_SIGNATURE = Buffer.from([0x50, 0x4b, 0x03, 0x04]);

const fileProblem = (message: string) => new DomainError('upload.unreadable', message, 'invalid', 'file');

/**
 * Reads the first worksheet of an uploaded CSV or XLSX file into text cells. Nothing is evaluated:
 * a CSV cell such as "=1+2" stays that text, and an XLSX formula cell is read as its formula text
 * (not its cached result), so no value reaches the catalogue that a person did not type.
 */
export async function readSpreadsheet(file: UploadedSpreadsheet | undefined): Promise<Sheet> {
  if (!file || file.size === 0) throw fileProblem('Attach a .csv or .xlsx file in the form field "file".');
  const format = formatOf(file);
  const workbook = new ExcelJS.Workbook();
  let worksheet: ExcelJS.Worksheet | undefined;
  if (format === 'csv') {
    const text = decodeUtf8(file.buffer);
    try {
      worksheet = await workbook.csv.read(Readable.from([text]), { map: (datum: string) => datum });
    } catch {
      throw fileProblem('The CSV file could not be read; check its quotes and separators (commas).');
    }
  } else {
    try {
      // exceljs types its input as an ArrayBuffer; it hands it to JSZip, which reads a Node Buffer as well.
      await workbook.xlsx.load(file.buffer as unknown as ArrayBuffer);
    } catch {
      throw fileProblem('The .xlsx file could not be read; save it again from your spreadsheet program.');
    }
    worksheet = workbook.worksheets[0];
  }
  if (!worksheet) throw fileProblem('The file has no worksheet.');
  return toSheet(worksheet, file.originalname);
}

function formatOf(file: UploadedSpreadsheet): Format {
  const extension = /\.([^.]+)$/.exec(file.originalname)?.[1]?.toLowerCase();
  const format: Format | null = extension === 'csv' ? 'csv' : extension === 'xlsx' ? 'xlsx' : null;
  if (!format) throw fileProblem('Upload a .csv or .xlsx file.');
  const mime = file.mimetype.toLowerCase().split(';')[0]!.trim();
  if (!MIME_TYPES[format].includes(mime)) throw fileProblem(`The file is named .${extension} but was sent as ${mime || 'an unknown type'}.`);
  const looksZipped = file.buffer.subarray(0, 4).equals(ZIP_SIGNATURE);
  if (format === 'xlsx' && !looksZipped) throw fileProblem('The file is named .xlsx but is not an Excel workbook.');
  if (format === 'csv' && (looksZipped || file.buffer.includes(0))) throw fileProblem('The file is named .csv but is not plain text.');
  return format;
}

function decodeUtf8(buffer: Buffer): string {
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(buffer);
  } catch {
    throw fileProblem('The CSV file is not UTF-8 text; save it as "CSV UTF-8" and upload it again.');
  }
}

function toSheet(worksheet: ExcelJS.Worksheet, fileName: string): Sheet {
  const lines: { row: number; cells: string[] }[] = [];
  worksheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    const cells: string[] = [];
    row.eachCell({ includeEmpty: true }, (cell, column) => {
      cells[column - 1] = cellText(cell);
    });
    lines.push({ row: rowNumber, cells: Array.from(cells, (value) => value ?? '') });
  });
  const nonEmpty = lines.filter((line) => line.cells.some((value) => value !== ''));
  const [header, ...rows] = nonEmpty;
  if (!header || header.row !== 1) throw fileProblem('Row 1 must hold the column headings.');
  if (rows.length === 0) throw fileProblem('The file has headings but no rows.');
  if (rows.length > SPREADSHEET_MAX_ROWS) throw fileProblem(`The file has ${rows.length} rows; upload at most ${SPREADSHEET_MAX_ROWS} at a time.`);
  const width = Math.max(...nonEmpty.map((line) => line.cells.length));
  const pad = (cells: string[]) => Array.from({ length: width }, (_, i) => cells[i] ?? '');
  return {
    fileName,
    headers: pad(header.cells.map((value, i) => (i === 0 ? value.replace(/^\uFEFF/, '') : value))),
    rows: rows.map((line) => ({ row: line.row, cells: pad(line.cells) })),
  };
}

function cellText(cell: ExcelJS.Cell): string {
  const value = cell.value;
  if (value === null || value === undefined) return '';
  switch (cell.type) {
    case ExcelJS.ValueType.Formula:
      return `=${cell.formula}`;
    case ExcelJS.ValueType.Number:
      return numberText(value as number);
    case ExcelJS.ValueType.Date:
      return dateText(value as Date);
    case ExcelJS.ValueType.RichText:
      return (value as ExcelJS.CellRichTextValue).richText.map((part) => part.text).join('').trim();
    case ExcelJS.ValueType.Hyperlink:
      return String((value as ExcelJS.CellHyperlinkValue).text ?? '').trim();
    case ExcelJS.ValueType.Error:
      return (value as ExcelJS.CellErrorValue).error;
    default:
      return String(value).trim();
  }
}

// Excel keeps 15 significant digits (Microsoft, "Excel specifications and limits"); beyond them a
// stored double shows binary noise such as 0.30000000000000004.
function numberText(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return new Big(value.toPrecision(15)).toFixed();
}

// exceljs reads dates as UTC wall-clock time.
function dateText(value: Date): string {
  const iso = value.toISOString();
  return iso.endsWith('T00:00:00.000Z') ? iso.slice(0, 10) : iso;
}
