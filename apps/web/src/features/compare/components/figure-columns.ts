import type { BranchFigures } from '../api/compare-queries';
import { compareDecimals, countText, groupedText, percentText } from './figure-format';

export type FigureKey = Exclude<keyof BranchFigures, 'branchId' | 'branchName'>;
type FigureKind = 'money' | 'fraction' | 'count' | 'hours';

export type FigureColumn = {
  key: FigureKey;
  label: string;
  kind: FigureKind;
  /** Why the figure can be missing (it is worked out from a base that can be zero), as a phrase. */
  missing?: string;
  width: number;
};

// Left to right as an owner reads a branch: takings, then colour, retail, time, clients, pay, corrections.
export const figureColumns: FigureColumn[] = [
  { key: 'serviceRevenue', label: 'Service revenue', kind: 'money', width: 124 },
  { key: 'retailRevenue', label: 'Retail revenue', kind: 'money', width: 116 },
  { key: 'tickets', label: 'Tickets', kind: 'count', width: 80 },
  { key: 'averageTicket', label: 'Average ticket', kind: 'money', width: 112, missing: 'no tickets' },
  { key: 'colourServiceRevenue', label: 'Colour services', kind: 'money', width: 118 },
  { key: 'colourProductCost', label: 'Colour product cost', kind: 'money', width: 128 },
  { key: 'colourCostShare', label: 'Colour cost share', kind: 'fraction', width: 116, missing: 'no colour service revenue' },
  { key: 'productChargeRecovered', label: 'Product charge recovered', kind: 'money', width: 136, missing: 'no approved payroll run covers these dates' },
  { key: 'retailToServiceRatio', label: 'Retail to service', kind: 'fraction', width: 116, missing: 'no service revenue' },
  { key: 'stylistHours', label: 'Stylist hours', kind: 'hours', width: 104 },
  { key: 'revenuePerStylistHour', label: 'Revenue per stylist hour', kind: 'money', width: 132, missing: 'no stylist hours recorded' },
  { key: 'newClients', label: 'New clients', kind: 'count', width: 96 },
  { key: 'returningClients', label: 'Returning clients', kind: 'count', width: 112 },
  { key: 'rebookingRate', label: 'Rebooking rate', kind: 'fraction', width: 112, missing: 'no clients seen' },
  { key: 'tips', label: 'Tips', kind: 'money', width: 100 },
  { key: 'commissionCost', label: 'Commission cost', kind: 'money', width: 120, missing: 'no approved payroll run covers these dates' },
  { key: 'commissionCostShare', label: 'Commission share', kind: 'fraction', width: 120, missing: 'no commission cost to compare' },
  { key: 'voids', label: 'Voids', kind: 'count', width: 72 },
  { key: 'refunds', label: 'Refunds', kind: 'count', width: 80 },
  { key: 'refundedAmount', label: 'Refunded', kind: 'money', width: 110 },
];

export const NO_FIGURE = '—';

/** The API's heading and definition of each figure, by its field name (GET /api/compare/definitions). */
export type Glossary = Map<string, { label: string; definition: string }>;

export const glossaryOf = (figures: { figure: string; label: string; definition: string }[]): Glossary =>
  new Map(figures.map(({ figure, label, definition }) => [figure, { label, definition }]));

/** The API's heading where it has one, so the app and the workbook say the same. */
export const labelOf = (key: string, fallback: string, glossary: Glossary): string => glossary.get(key)?.label ?? fallback;

/** A figure as the table shows it: money and hours grouped, fractions as percentages, a dash when there is none. */
export function figureText(column: FigureColumn, row: Partial<Record<FigureKey, string | number | null>>): string {
  const value = row[column.key];
  if (value === null || value === undefined) return NO_FIGURE;
  if (typeof value === 'number') return countText(value);
  return column.kind === 'fraction' ? percentText(value) : groupedText(value);
}

export type SortOrder = { key: FigureKey | 'branchName'; direction: 'ascending' | 'descending' };

/** Branch rows in the chosen order; a missing figure sorts last either way, ties keep the name order. */
export function sortRows(rows: BranchFigures[], order: SortOrder): BranchFigures[] {
  const sign = order.direction === 'ascending' ? 1 : -1;
  const byName = (a: BranchFigures, b: BranchFigures) => a.branchName.localeCompare(b.branchName);
  return [...rows].sort((a, b) => {
    if (order.key === 'branchName') return sign * byName(a, b);
    const x = a[order.key];
    const y = b[order.key];
    if (x === null || y === null) return x === y ? byName(a, b) : x === null ? 1 : -1;
    const difference = typeof x === 'number' && typeof y === 'number' ? x - y : compareDecimals(String(x), String(y));
    return difference === 0 ? byName(a, b) : sign * difference;
  });
}
