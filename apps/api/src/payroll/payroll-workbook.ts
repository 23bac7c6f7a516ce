import type { Writable } from 'node:stream';
import { setTimeout as pause } from 'node:timers/promises';
import type { PayInput } from '@tressury/domain';
import Big from 'big.js';
import ExcelJS from 'exceljs';
import { HeapBudget } from '../common/heap-budget.js';
import type { PayrollLineFigures } from './payroll-runs.repository.js';

// The one module that knows exceljs for payroll exports (STACK.md: unmaintained since 2023, keep it behind one module).

export type PayrollExport = {
  organisationName: string;
  startDate: string;
  endDate: string;
  status: string;
  /** In the order of the Summary: branch, then staff name. */
  lines: PayrollLineFigures[];
  /** ISO 4217 code per branch id, for the money formats. */
  currencyOf: Map<string, string>;
  /** The stored inputs of some of the lines by line id: the Lines sheet asks for a page at a time. */
  inputsOf: (lineIds: string[]) => Promise<Map<string, PayInput>>;
};

export const PAY_RULES_NOTE =
  'These figures follow the pay rules configured in Tressury (plans, branch minimum wage and overtime settings). Local law governs: have them confirmed by a payroll professional before paying.';

type Column = { header: string; width: number; kind: 'text' | 'hours' | 'money'; value: (line: PayrollLineFigures) => string };

export const SUMMARY_COLUMNS: Column[] = [
  { header: 'Staff ID', width: 38, kind: 'text', value: (l) => l.staffId },
  { header: 'Name', width: 24, kind: 'text', value: (l) => l.staffName },
  { header: 'Branch', width: 18, kind: 'text', value: (l) => l.branchName },
  { header: 'Hours', width: 10, kind: 'hours', value: (l) => l.hours },
  { header: 'Service revenue', width: 16, kind: 'money', value: (l) => l.serviceRevenue },
  { header: 'Product charge', width: 16, kind: 'money', value: (l) => l.productCharge },
  { header: 'Commissionable revenue', width: 16, kind: 'money', value: (l) => l.commissionableRevenue },
  { header: 'Service commission', width: 16, kind: 'money', value: (l) => l.serviceCommission },
  { header: 'Retail commission', width: 16, kind: 'money', value: (l) => l.retailCommission },
  { header: 'Hourly pay', width: 14, kind: 'money', value: (l) => l.hourlyPay },
  { header: 'Tips', width: 14, kind: 'money', value: (l) => l.tips },
  { header: 'Minimum-wage top-up', width: 16, kind: 'money', value: (l) => l.minimumWageTopUp },
  { header: 'Overtime premium', width: 16, kind: 'money', value: (l) => l.overtimePremium },
  { header: 'Gross pay', width: 16, kind: 'money', value: (l) => l.grossPay },
];

/** The header row of the Summary and branch sheets; data starts on the row after it. */
export const HEADER_ROW = 4;

const HOURS_FORMAT = '#,##0.00#';
const DATE_FORMAT = 'yyyy-mm-dd';
const SHARE_FORMAT = '0.00##';
const moneyFormat = (currency: string | undefined) => (currency ? `#,##0.00 "${currency}";-#,##0.00 "${currency}"` : '#,##0.00;-#,##0.00');

/**
 * A text cell that a spreadsheet program could take for a formula (it begins with = + - @, a tab, a
 * carriage return, a line feed or another control character) is prefixed with an apostrophe, as OWASP's
 * "CSV Injection" page advises; every other text is left as it is.
 */
export function neutralise(text: string): string {
  // eslint-disable-next-line no-control-regex
  return /^[=+\-@\u0000-\u001f]/.test(text) ? `'${text}` : text;
}

/** e.g. Thistlewick-Hair-Collective-payroll-2026-11-02-to-2026-11-15.xlsx */
export function exportFileName(organisationName: string, startDate: string, endDate: string, extension: 'xlsx' | 'csv', suffix = ''): string {
  const name = organisationName.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-+|-+$/g, '') || 'organisation';
  return `${name}-payroll${suffix}-${startDate}-to-${endDate}.${extension}`;
}

const utcDate = (date: string): Date => {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  // exceljs writes dates as UTC wall-clock time (STACK.md), so the calendar day is built in UTC.
  return new Date(Date.UTC(y, m - 1, d));
};

const columnLetter = (index: number): string => {
  let n = index + 1;
  let letters = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    letters = String.fromCharCode(65 + r) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
};

const sheetName = (name: string, taken: Set<string>): string => {
  const base = name.replace(/[[\]:*?/\\]/g, ' ').trim().slice(0, 28) || 'Branch';
  let candidate = base;
  for (let i = 2; taken.has(candidate.toLowerCase()); i++) candidate = `${base.slice(0, 26)} ${i}`;
  taken.add(candidate.toLowerCase());
  return candidate;
};

// Lines whose stored inputs are read at once for the Lines sheet (about 1.3 MB of JSON at 80 services each).
const INPUTS_PAGE = 100;
// Written rows the zip may have yet to compress before the Lines sheet waits for it.
const ZIP_BACKLOG_BYTES = 4 * 1024 * 1024;
// Never wait on the zip for longer than this per page: a stuck zip must not hang the export.
const ZIP_WAIT_LIMIT_MS = 30_000;
// Garbage the Lines sheet may leave before it is collected between pages.
const HEAP_ALLOWANCE_MB = 24;

/**
 * Waits until the zip is reading the sheet and has caught up with what it has written. exceljs's streaming
 * writer ignores back-pressure: rows written while the zip is still busy with earlier entries, or faster
 * than zlib compresses them, would pile up in memory until the end. The zip starts reading an entry by
 * piping the sheet's stream into a PassThrough of its own.
 */
async function zipCaughtUp(sheet: ExcelJS.Worksheet): Promise<void> {
  // archiver's PassThrough comes from readable-stream 2, which predates writableLength and readableLength.
  type Entry = { _writableState?: { length: number }; _readableState?: { length: number } };
  const pipes = (sheet as unknown as { stream: { pipes?: Entry[] } }).stream.pipes;
  for (let waited = 0; waited < ZIP_WAIT_LIMIT_MS; waited += 2) {
    const entry = pipes?.[0];
    if (!entry?._writableState || !entry._readableState) return; // not the exceljs this was written for
    if (entry._writableState.length + entry._readableState.length <= ZIP_BACKLOG_BYTES) return;
    await pause(2);
  }
}

/**
 * One style object per number format, shared by every cell that has it: exceljs looks a cell's style up by
 * object identity and otherwise serialises it once per cell, which was a fifth of the writing time.
 */
class SharedStyles {
  readonly text: Partial<ExcelJS.Style> = {};
  private readonly byFormat = new Map<string, Partial<ExcelJS.Style>>();

  format(numFmt: string): Partial<ExcelJS.Style> {
    let style = this.byFormat.get(numFmt);
    if (!style) this.byFormat.set(numFmt, (style = { numFmt }));
    return style;
  }

  /** Adds a data row whose cells take the given styles (null: text); the row is written out at once. */
  addRow(sheet: ExcelJS.Worksheet, values: unknown[], formats: (string | null)[]): void {
    // A row has a style of its own too (missing from exceljs's typings).
    const row = sheet.addRow(values) as ExcelJS.Row & { style: Partial<ExcelJS.Style> };
    row.style = this.text;
    formats.forEach((numFmt, i) => {
      if (values[i] !== null && values[i] !== undefined) row.getCell(i + 1).style = numFmt === null ? this.text : this.format(numFmt);
    });
    row.commit();
  }
}

/**
 * The accountant's workbook, streamed into `output` with exceljs's streaming writer: Summary, one sheet per
 * branch, and the Lines behind the figures, whose inputs are read a page of lines at a time.
 */
export async function writePayrollWorkbook(data: PayrollExport, output: Writable): Promise<void> {
  const workbook = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: output, useStyles: true, useSharedStrings: false });
  workbook.creator = 'Tressury';
  const styles = new SharedStyles();

  const currencies = new Set(data.lines.map((l) => data.currencyOf.get(l.branchId)));
  const totalCurrency = currencies.size === 1 ? [...currencies][0] : undefined;
  const taken = new Set<string>(['summary', 'lines']);

  writeFigureSheet(workbook.addWorksheet('Summary', { views: [{ state: 'frozen', ySplit: HEADER_ROW, xSplit: 2 }] }), styles, data, data.lines, 'All branches', totalCurrency);
  const byBranch = new Map<string, PayrollLineFigures[]>();
  for (const line of data.lines) {
    const lines = byBranch.get(line.branchId);
    if (lines) lines.push(line);
    else byBranch.set(line.branchId, [line]);
  }
  for (const lines of [...byBranch.values()].sort((a, b) => a[0]!.branchName.localeCompare(b[0]!.branchName))) {
    const name = sheetName(lines[0]!.branchName, taken);
    const sheet = workbook.addWorksheet(name, { views: [{ state: 'frozen', ySplit: HEADER_ROW, xSplit: 2 }] });
    writeFigureSheet(sheet, styles, data, lines, lines[0]!.branchName, data.currencyOf.get(lines[0]!.branchId));
  }
  await writeLinesSheet(workbook.addWorksheet('Lines', { views: [{ state: 'frozen', ySplit: 1 }] }), styles, data);
  // Resolves once `output` has taken the last byte.
  await workbook.commit();
}

function writeFigureSheet(sheet: ExcelJS.Worksheet, styles: SharedStyles, data: PayrollExport, lines: PayrollLineFigures[], scope: string, totalCurrency: string | undefined): void {
  sheet.columns = SUMMARY_COLUMNS.map((c) => ({ width: c.width }));
  sheet.addRow([neutralise(`Payroll ${data.startDate} to ${data.endDate} — ${data.organisationName} — ${scope} (${data.status})`)]).commit();
  sheet.addRow([PAY_RULES_NOTE]).commit();
  sheet.addRow([]).commit();
  const header = sheet.addRow(SUMMARY_COLUMNS.map((c) => c.header));
  header.font = { bold: true };
  header.commit();
  const formatOf = (c: Column, currency: string | undefined) => (c.kind === 'text' ? null : c.kind === 'hours' ? HOURS_FORMAT : moneyFormat(currency));
  for (const line of lines) {
    const currency = data.currencyOf.get(line.branchId);
    styles.addRow(
      sheet,
      SUMMARY_COLUMNS.map((c) => (c.kind === 'text' ? neutralise(c.value(line)) : Number(c.value(line)))),
      SUMMARY_COLUMNS.map((c) => formatOf(c, currency)),
    );
  }
  const first = HEADER_ROW + 1;
  const last = HEADER_ROW + lines.length;
  const totals = sheet.addRow(
    SUMMARY_COLUMNS.map((c, i) => {
      if (i === 0) return 'Total';
      if (c.kind === 'text') return null;
      // The cached result is the exact sum of the rounded figures, so the sheet adds up to the cent.
      const result = lines.reduce((sum, l) => sum.plus(c.value(l)), new Big(0));
      const letter = columnLetter(i);
      return { formula: `SUM(${letter}${first}:${letter}${Math.max(last, first)})`, result: Number(result.toFixed(c.kind === 'hours' ? 3 : 2)) };
    }),
  );
  totals.font = { bold: true };
  SUMMARY_COLUMNS.forEach((c, i) => {
    if (c.kind !== 'text') totals.getCell(i + 1).numFmt = formatOf(c, totalCurrency)!;
  });
  totals.commit();
  sheet.commit();
}

export const LINES_COLUMNS = ['Staff ID', 'Name', 'Branch', 'Kind', 'Line ID', 'Date', 'Colour service', 'Price or amount', 'Stylist share', 'Product cost'];

async function writeLinesSheet(sheet: ExcelJS.Worksheet, styles: SharedStyles, data: PayrollExport): Promise<void> {
  sheet.columns = [38, 24, 18, 9, 48, 12, 9, 16, 10, 14].map((width) => ({ width }));
  const header = sheet.addRow(LINES_COLUMNS);
  header.font = { bold: true };
  header.commit();
  const budget = new HeapBudget(HEAP_ALLOWANCE_MB);
  for (let start = 0; start < data.lines.length; start += INPUTS_PAGE) {
    await zipCaughtUp(sheet);
    budget.settle();
    const page = data.lines.slice(start, start + INPUTS_PAGE);
    const inputs = await data.inputsOf(page.map((l) => l.id));
    for (const line of page) {
      const currency = moneyFormat(data.currencyOf.get(line.branchId));
      const input = inputs.get(line.id)!;
      const who = [neutralise(line.staffId), neutralise(line.staffName), neutralise(line.branchName)];
      const formats = [null, null, null, null, null, DATE_FORMAT, null, currency, SHARE_FORMAT, currency];
      for (const s of input.serviceLines) {
        styles.addRow(sheet, [...who, 'service', neutralise(s.id), utcDate(s.date), s.isColour ? 'yes' : 'no', Number(s.price), Number(s.share ?? '1'), Number(s.productCost)], formats);
      }
      for (const a of input.productChargeAdjustments ?? []) {
        styles.addRow(sheet, [...who, 'product charge adjustment', neutralise(a.id), utcDate(a.date), null, Number(a.amount), null, null], formats);
      }
      for (const r of input.retailLines) {
        styles.addRow(sheet, [...who, 'retail', neutralise(r.id), utcDate(r.date), null, Number(r.amount), null, null], formats);
      }
    }
  }
  sheet.commit();
}

const csvField = (value: string): string => `"${value.replaceAll('"', '""')}"`;

/** The Summary as CSV: every field quoted, text neutralised as in the workbook, money as decimal strings. */
export function writeSummaryCsv(lines: PayrollLineFigures[]): string {
  const rows = [SUMMARY_COLUMNS.map((c) => c.header), ...lines.map((l) => SUMMARY_COLUMNS.map((c) => (c.kind === 'text' ? neutralise(c.value(l)) : c.value(l))))];
  return rows.map((row) => row.map(csvField).join(',')).join('\r\n') + '\r\n';
}
