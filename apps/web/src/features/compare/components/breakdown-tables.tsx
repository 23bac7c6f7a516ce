import { HTMLTable, Tag } from '@blueprintjs/core';
import { businessDateText } from '../../../lib/business-date';
import type { BranchDays, BranchStylists } from '../api/compare-queries';
import { type FigureColumn, figureColumns, figureText, type Glossary, labelOf, NO_FIGURE } from './figure-columns';
import { countText, groupedText } from './figure-format';

type DayRow = BranchDays['rows'][number];
type StylistRow = BranchStylists['rows'][number];

/** A branch's figures day by day: the comparison's columns that a single day has. */
export function DaysTable({ rows, glossary }: { rows: DayRow[]; glossary: Glossary }) {
  const first = rows[0];
  const columns: FigureColumn[] = first ? figureColumns.filter((column) => column.key in first) : [];
  if (!first) return <p className="tr-muted">No business dates in this range.</p>;
  return (
    <div className="tr-table-frame tr-breakdown-frame">
      <HTMLTable compact striped className="tr-table tr-breakdown" aria-label="Days">
        <thead>
          <tr>
            <th scope="col">Business date</th>
            {columns.map((column) => (
              <th key={column.key} scope="col" className="tr-figure" title={glossary.get(column.key)?.definition}>
                {labelOf(column.key, column.label, glossary)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.date}>
              <th scope="row" className="tr-row-head">
                {businessDateText(row.date)}
                {!row.dayClosed &&
                  (row.tickets === 0 ? (
                    <span className="tr-muted tr-day-note">no tickets</span>
                  ) : (
                    <Tag minimal className="tr-day-note" title="The manager has not closed this day: its figures can still change.">
                      not closed yet
                    </Tag>
                  ))}
              </th>
              {columns.map((column) => {
                const text = figureText(column, row);
                return (
                  <td key={column.key} className="tr-figure" title={text === NO_FIGURE && column.missing ? `This day: ${column.missing}.` : undefined}>
                    {text}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}

const stylistColumns: { key: Exclude<keyof StylistRow, 'staffId' | 'staffName'>; label: string }[] = [
  { key: 'serviceRevenue', label: 'Service revenue' },
  { key: 'colourServiceRevenue', label: 'Colour services' },
  { key: 'colourProductCost', label: 'Colour product cost' },
  { key: 'retailRevenue', label: 'Retail revenue' },
  { key: 'tickets', label: 'Tickets' },
  { key: 'averageTicket', label: 'Average ticket' },
  { key: 'hours', label: 'Hours' },
  { key: 'revenuePerHour', label: 'Revenue per hour' },
  { key: 'tips', label: 'Tips' },
];

const cellText = (value: string | number | null): string => (value === null ? NO_FIGURE : typeof value === 'number' ? countText(value) : groupedText(value));

/** Who worked at the branch in these dates, by name. */
export function StylistsTable({ rows, glossary }: { rows: StylistRow[]; glossary: Glossary }) {
  if (rows.length === 0) return <p className="tr-muted">Nobody served, sold or logged hours here in these dates.</p>;
  return (
    <div className="tr-table-frame tr-breakdown-frame">
      <HTMLTable compact striped className="tr-table tr-breakdown" aria-label="Stylists">
        <thead>
          <tr>
            <th scope="col">Stylist</th>
            {stylistColumns.map((column) => (
              <th key={column.key} scope="col" className="tr-figure" title={glossary.get(column.key)?.definition}>
                {labelOf(column.key, column.label, glossary)}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.staffId}>
              <th scope="row" className="tr-row-head">
                {row.staffName}
              </th>
              {stylistColumns.map((column) => (
                <td key={column.key} className="tr-figure">
                  {cellText(row[column.key])}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}
