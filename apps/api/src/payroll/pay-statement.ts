import type { PayResult } from '@tressury/domain';
import type { PayrollLineRow } from '@tressury/schema';
import Big from 'big.js';
import ExcelJS from 'exceljs';
import { neutralise, PAY_RULES_NOTE } from './payroll-workbook.js';

/** One staff member's line of a run, with what the statement says around it. */
export type PayStatement = {
  organisationName: string;
  startDate: string;
  endDate: string;
  runStatus: string;
  /** ISO 4217 code of the staff member's home branch. */
  currency: string;
  line: PayrollLineRow;
};

export const STATEMENT_CONTENT_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

type Figure = { label: string; value: string; kind: 'hours' | 'money' };

/** "1234.5" → "1,234.50"; the value is already rounded, this only lays it out. */
function grouped(value: string, dp: number): string {
  const fixed = new Big(value).toFixed(dp);
  const negative = fixed.startsWith('-');
  const [whole = '0', fraction] = (negative ? fixed.slice(1) : fixed).split('.');
  return `${negative ? '-' : ''}${whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',')}${fraction ? `.${fraction}` : ''}`;
}

const percent = (rate: string) => `${new Big(rate).times(100).toFixed()}%`;

const hoursText = (hours: string) => {
  const value = new Big(hours);
  return grouped(hours, Math.max(2, Math.min(3, value.c.length - value.e - 1)));
};

function tierLabel(tier: PayResult['tierBreakdown'][number]): string {
  const band = tier.to === null ? `${grouped(tier.from, 2)} and up` : `${grouped(tier.from, 2)} to ${grouped(tier.to, 2)}`;
  return `${band} at ${percent(tier.rate)} on ${grouped(tier.base, 2)}`;
}

/** The statement's figures in order; tier rows sit between commissionable revenue and service commission. */
function figures(line: PayrollLineRow): { before: Figure[]; tiers: Figure[]; after: Figure[]; gross: Figure } {
  const result = line.result as PayResult;
  return {
    before: [
      { label: 'Hours worked', value: line.hours, kind: 'hours' },
      { label: 'Service revenue', value: line.serviceRevenue, kind: 'money' },
      { label: 'Product charge', value: line.productCharge, kind: 'money' },
      { label: 'Commissionable revenue', value: line.commissionableRevenue, kind: 'money' },
    ],
    tiers: result.tierBreakdown.map((tier) => ({ label: tierLabel(tier), value: tier.commission, kind: 'money' })),
    after: [
      { label: 'Service commission', value: line.serviceCommission, kind: 'money' },
      { label: 'Retail commission', value: line.retailCommission, kind: 'money' },
      { label: 'Hourly pay', value: line.hourlyPay, kind: 'money' },
      { label: 'Tips', value: line.tips, kind: 'money' },
      { label: 'Minimum-wage top-up', value: line.minimumWageTopUp, kind: 'money' },
      { label: 'Overtime premium', value: line.overtimePremium, kind: 'money' },
    ],
    gross: { label: 'Gross pay', value: line.grossPay, kind: 'money' },
  };
}

export function statementSubject(statement: PayStatement): string {
  return `Pay statement ${statement.startDate} to ${statement.endDate} (${statement.organisationName})`;
}

/** e.g. pay-statement-Rhea-Castellane-2026-11-02-to-2026-11-15.xlsx */
export function statementFileName(statement: PayStatement): string {
  const name = statement.line.staffName.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-+|-+$/g, '') || 'staff';
  return `pay-statement-${name}-${statement.startDate}-to-${statement.endDate}.xlsx`;
}

/** Prose lines of a plain-text message no wider than its figure lines, well inside what mail programs expect. */
function wrapped(paragraph: string, width = 64): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of paragraph.split(/\s+/).filter(Boolean)) {
    if (current && current.length + 1 + word.length > width) {
      lines.push(current);
      current = word;
    } else current = current ? `${current} ${word}` : word;
  }
  return current ? [...lines, current] : lines;
}

/** The e-mail body: every figure of the line in plain text, then the pay-rules note. */
export function statementText(statement: PayStatement): string {
  const { line, currency } = statement;
  const parts = figures(line);
  const row = (figure: Figure, indent = '') => {
    const amount = figure.kind === 'hours' ? `${hoursText(figure.value)} hrs` : `${grouped(figure.value, 2)} ${currency}`;
    return `${`${indent}${figure.label}`.padEnd(46)} ${amount.padStart(14)}`;
  };
  return [
    `Hello ${line.staffName},`,
    '',
    ...wrapped(
      `Here is your pay statement from ${statement.organisationName} for the pay period ${statement.startDate} to ${statement.endDate}` +
        ` (home branch ${line.branchName}; payroll ${statement.runStatus}). The same figures are in the attached workbook.`,
    ),
    '',
    ...parts.before.map((f) => row(f)),
    'Commission by tier',
    ...parts.tiers.map((f) => row(f, '  ')),
    ...parts.after.map((f) => row(f)),
    row(parts.gross),
    '',
    ...wrapped(PAY_RULES_NOTE),
    '',
    ...wrapped('If a figure looks wrong, ask whoever runs payroll at your salon before pay day.'),
    '',
  ].join('\n');
}

const HOURS_FORMAT = '#,##0.00#';
const DATE_FORMAT = 'yyyy-mm-dd';
const moneyFormat = (currency: string) => `#,##0.00 "${currency}";-#,##0.00 "${currency}"`;

const utcDate = (date: string): Date => {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  // exceljs writes dates as UTC wall-clock time (STACK.md).
  return new Date(Date.UTC(y, m - 1, d));
};

/** One sheet: who and which period, every figure with money formats, gross pay as the sum of its parts, the note. */
export async function writeStatementWorkbook(statement: PayStatement): Promise<Buffer> {
  const { line, currency } = statement;
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Tressury';
  const sheet = workbook.addWorksheet('Statement', { views: [{ showGridLines: false }] });
  sheet.columns = [{ width: 52 }, { width: 18 }];

  const title = sheet.addRow(['Pay statement']);
  title.font = { bold: true, size: 14 };
  sheet.addRow([neutralise(line.staffName)]).font = { bold: true };
  sheet.addRow([neutralise(`${statement.organisationName} — ${line.branchName}`)]);
  sheet.addRow(['Period from', utcDate(statement.startDate)]).getCell(2).numFmt = DATE_FORMAT;
  sheet.addRow(['Period to', utcDate(statement.endDate)]).getCell(2).numFmt = DATE_FORMAT;
  sheet.addRow(['Payroll', statement.runStatus]);
  sheet.addRow([]);
  const header = sheet.addRow(['Figure', `Amount (${currency})`]);
  header.font = { bold: true };
  header.getCell(2).alignment = { horizontal: 'right' };

  const parts = figures(line);
  const put = (figure: Figure) => {
    const row = sheet.addRow([figure.label, Number(figure.value)]);
    row.getCell(2).numFmt = figure.kind === 'hours' ? HOURS_FORMAT : moneyFormat(currency);
    return row;
  };
  parts.before.forEach(put);
  sheet.addRow(['Commission by tier']).font = { italic: true };
  for (const tier of parts.tiers) put(tier).getCell(1).alignment = { indent: 1 };
  const payRows = parts.after.map((figure) => put(figure).number);
  // The cached result is the stored gross pay (libs/domain sums the same rounded parts); the formula shows its make-up.
  const gross = sheet.addRow([parts.gross.label, { formula: payRows.map((r) => `B${r}`).join('+'), result: Number(line.grossPay) }]);
  gross.font = { bold: true };
  gross.getCell(2).numFmt = moneyFormat(currency);
  gross.getCell(2).border = { top: { style: 'thin' } };

  sheet.addRow([]);
  const note = sheet.addRow([PAY_RULES_NOTE]);
  sheet.mergeCells(note.number, 1, note.number, 2);
  note.getCell(1).alignment = { wrapText: true, vertical: 'top' };
  note.height = 48;
  return Buffer.from(await workbook.xlsx.writeBuffer());
}
