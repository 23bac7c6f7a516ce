import ExcelJS from 'exceljs';
import { FEE_DEFINITIONS, FEE_NOTE, FIGURE_DEFINITIONS } from './compare-definitions.js';
import type { BranchComparisonView, BranchFiguresView } from './dto/branch-comparison.view.js';
import type { FeeStatementRowView } from './dto/fee-statements.view.js';

// The one module that knows exceljs for the comparison's workbooks (STACK.md: keep its use behind one module).

export type ExportedFile = { fileName: string; contentType: string; body: Buffer };

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';
const DATE_FORMAT = 'yyyy-mm-dd';
const SHARE_FORMAT = '0.00%';
const HOURS_FORMAT = '#,##0.00#';
const moneyFormat = (currency: string | undefined) => (currency ? `#,##0.00 "${currency}";-#,##0.00 "${currency}"` : '#,##0.00;-#,##0.00');

/**
 * Text a spreadsheet program could take for a formula (it begins with = + - @, a tab, a carriage return, a
 * line feed or another control character) is prefixed with an apostrophe, as OWASP's "CSV Injection" advises.
 */
export function neutralise(text: string): string {
  // eslint-disable-next-line no-control-regex
  return /^[=+\-@\u0000-\u001f]/.test(text) ? `'${text}` : text;
}

const fileStem = (text: string) => text.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-+|-+$/g, '') || 'organisation';

const utcDate = (date: string): Date => {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  // exceljs writes dates as UTC wall-clock time (STACK.md).
  return new Date(Date.UTC(y, m - 1, d));
};

type Kind = 'money' | 'count' | 'share' | 'hours';
type Column = { figure: keyof BranchFiguresView; kind: Kind; width: number };

const COMPARISON_COLUMNS: Column[] = [
  { figure: 'serviceRevenue', kind: 'money', width: 15 },
  { figure: 'retailRevenue', kind: 'money', width: 14 },
  { figure: 'tickets', kind: 'count', width: 9 },
  { figure: 'averageTicket', kind: 'money', width: 12 },
  { figure: 'colourServiceRevenue', kind: 'money', width: 14 },
  { figure: 'colourProductCost', kind: 'money', width: 14 },
  { figure: 'colourCostShare', kind: 'share', width: 11 },
  { figure: 'productChargeRecovered', kind: 'money', width: 15 },
  { figure: 'retailToServiceRatio', kind: 'share', width: 11 },
  { figure: 'stylistHours', kind: 'hours', width: 10 },
  { figure: 'revenuePerStylistHour', kind: 'money', width: 13 },
  { figure: 'newClients', kind: 'count', width: 10 },
  { figure: 'returningClients', kind: 'count', width: 11 },
  { figure: 'rebookingRate', kind: 'share', width: 11 },
  { figure: 'tips', kind: 'money', width: 12 },
  { figure: 'commissionCost', kind: 'money', width: 14 },
  { figure: 'commissionCostShare', kind: 'share', width: 12 },
  { figure: 'voids', kind: 'count', width: 8 },
  { figure: 'refunds', kind: 'count', width: 8 },
  { figure: 'refundedAmount', kind: 'money', width: 12 },
];

const labelOf = (figure: string) => FIGURE_DEFINITIONS.find((d) => d.figure === figure)?.label ?? figure;
const formatOf = (kind: Kind, currency: string | undefined) =>
  kind === 'money' ? moneyFormat(currency) : kind === 'share' ? SHARE_FORMAT : kind === 'hours' ? HOURS_FORMAT : '0';

async function toFile(workbook: ExcelJS.Workbook, fileName: string): Promise<ExportedFile> {
  return { fileName, contentType: XLSX, body: Buffer.from(await workbook.xlsx.writeBuffer()) };
}

/** The comparison table (one row per branch and the totals) and a sheet of the figures' definitions. */
export async function comparisonWorkbook(input: { organisationName: string; currency: string | undefined; view: BranchComparisonView }): Promise<ExportedFile> {
  const { view, currency } = input;
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Tressury';
  const sheet = workbook.addWorksheet('Comparison', { views: [{ state: 'frozen', ySplit: 4, xSplit: 1 }] });
  sheet.columns = [{ width: 24 }, ...COMPARISON_COLUMNS.map((c) => ({ width: c.width }))];
  sheet.addRow([neutralise(`Branch comparison ${view.from} to ${view.to} — ${input.organisationName}`)]);
  sheet.addRow([`Rebooking window: ${view.rebookingDays} days. Shares are fractions shown as percentages; an empty cell has no base. The Definitions sheet says how each figure is counted.`]);
  sheet.addRow([]);
  const header = sheet.addRow(['Branch', ...COMPARISON_COLUMNS.map((c) => labelOf(c.figure))]);
  header.font = { bold: true };
  for (const figures of [...view.rows, view.totals]) {
    const row = sheet.addRow([
      neutralise(figures.branchName),
      ...COMPARISON_COLUMNS.map((c) => {
        const value = figures[c.figure];
        return value === null ? null : Number(value);
      }),
    ]);
    COMPARISON_COLUMNS.forEach((c, i) => (row.getCell(i + 2).numFmt = formatOf(c.kind, currency)));
    if (figures.branchId === null) row.font = { bold: true };
  }
  writeDefinitions(workbook, FIGURE_DEFINITIONS);
  const name = `${fileStem(input.organisationName)}-branch-comparison-${view.from}-to-${view.to}.xlsx`;
  return toFile(workbook, name);
}

/**
 * One branch's fee statement for a month: the base day by day, then each fee as a formula over it with its
 * result cached, so a spreadsheet shows the same amounts Tressury computed.
 */
export async function feeStatementWorkbook(input: {
  organisationName: string;
  currency: string;
  month: string;
  statement: FeeStatementRowView;
  days: { date: string; serviceRevenue: string; retailRevenue: string; grossSales: string }[];
}): Promise<ExportedFile> {
  const { statement, currency } = input;
  const money = moneyFormat(currency);
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Tressury';
  const sheet = workbook.addWorksheet('Fee statement');
  sheet.columns = [{ width: 26 }, { width: 16 }, { width: 16 }, { width: 16 }];
  sheet.addRow([neutralise(`Franchise fee statement ${input.month} — ${statement.branchName} — ${input.organisationName}`)]);
  sheet.addRow([FEE_NOTE]);
  sheet.addRow([]);
  const header = sheet.addRow(['Business date', 'Service revenue', 'Retail revenue', 'Gross sales']);
  header.font = { bold: true };
  const first = sheet.rowCount + 1;
  for (const day of input.days) {
    const row = sheet.addRow([utcDate(day.date), Number(day.serviceRevenue), Number(day.retailRevenue), Number(day.grossSales)]);
    row.getCell(1).numFmt = DATE_FORMAT;
    [2, 3, 4].forEach((i) => (row.getCell(i).numFmt = money));
  }
  const last = Math.max(sheet.rowCount, first);
  sheet.addRow([]);
  const gross = sheet.addRow(['Gross sales', null, null, { formula: `SUM(D${first}:D${last})`, result: Number(statement.grossSales) }]);
  const royaltyRate = sheet.addRow(['Royalty rate', null, null, Number(statement.royaltyRate)]);
  const royalty = sheet.addRow(['Royalty', null, null, { formula: `ROUND(D${gross.number}*D${royaltyRate.number},2)`, result: Number(statement.royaltyAmount) }]);
  const marketingRate = sheet.addRow(['Marketing fund rate', null, null, Number(statement.marketingFundRate)]);
  const marketing = sheet.addRow(['Marketing fund', null, null, { formula: `ROUND(D${gross.number}*D${marketingRate.number},2)`, result: Number(statement.marketingFundAmount) }]);
  const total = sheet.addRow(['Total fees', null, null, { formula: `D${royalty.number}+D${marketing.number}`, result: Number(statement.totalFees) }]);
  [gross, royalty, marketing, total].forEach((row) => (row.getCell(4).numFmt = money));
  [royaltyRate, marketingRate].forEach((row) => (row.getCell(4).numFmt = '0.00###%'));
  total.font = { bold: true };
  writeDefinitions(workbook, FEE_DEFINITIONS);
  return toFile(workbook, `${fileStem(statement.branchName)}-franchise-fees-${input.month}.xlsx`);
}

function writeDefinitions(workbook: ExcelJS.Workbook, definitions: { label: string; definition: string }[]): void {
  const sheet = workbook.addWorksheet('Definitions');
  sheet.columns = [{ width: 26 }, { width: 120 }];
  const header = sheet.addRow(['Figure', 'How it is counted']);
  header.font = { bold: true };
  for (const d of definitions) sheet.addRow([d.label, d.definition]);
}
