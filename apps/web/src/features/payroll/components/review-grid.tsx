import { Classes, Menu, MenuItem } from '@blueprintjs/core';
import { ChevronDownIcon, SortAscIcon, SortDescIcon } from '@blueprintjs/icons';
import { Cell, Column, ColumnHeaderCell, type Region, SelectionModes, Table2 } from '@blueprintjs/table';
import '@blueprintjs/table/lib/css/table.css';
import { useMemo, useState } from 'react';
import type { PayrollLine } from '../api/payroll-run-queries';
import { compareDecimal, flagLabels, flagsOf, type MoneyKey, moneyColumns, totalsOf } from './review-figures';
import { ReviewFlags } from './review-flags';

type SortKey = 'staffName' | 'branchName' | 'hours' | MoneyKey | 'flags';
type Sort = { key: SortKey; direction: 'ascending' | 'descending' };

const ROW_HEIGHT = 30;
const HEADER_HEIGHT = 32;

function compareLines(key: SortKey): (a: PayrollLine, b: PayrollLine) => number {
  if (key === 'staffName' || key === 'branchName') return (a, b) => a[key].localeCompare(b[key]);
  if (key === 'flags') return (a, b) => flagsOf(a).length - flagsOf(b).length;
  return (a, b) => compareDecimal(a[key], b[key]);
}

// Wide enough for each heading with its menu button beside it.
const moneyWidths: Partial<Record<MoneyKey, number>> = {
  serviceRevenue: 140,
  productCharge: 136,
  commissionableRevenue: 140,
  serviceCommission: 164,
  retailCommission: 152,
  minimumWageTopUp: 184,
  overtimePremium: 158,
};

type ColumnSpec = { key: SortKey; label: string; width: number; figure: boolean };

const columns: ColumnSpec[] = [
  { key: 'staffName', label: 'Staff member', width: 190, figure: false },
  { key: 'branchName', label: 'Branch', width: 120, figure: false },
  { key: 'hours', label: 'Hours', width: 76, figure: true },
  ...moneyColumns.map(({ key, label }) => ({ key, label, width: moneyWidths[key] ?? 124, figure: true })),
  { key: 'flags', label: 'Flags', width: 330, figure: false },
];

type Props = { lines: PayrollLine[]; onOpen: (line: PayrollLine) => void };

/**
 * One row per staff member with the name column frozen while the figures scroll, sortable from each column's
 * header, and a totals row last that stays last however the rows are sorted.
 */
export function ReviewGrid({ lines, onOpen }: Props) {
  const [sort, setSort] = useState<Sort | null>(null);
  const rows = useMemo(() => {
    if (!sort) return lines;
    const compare = compareLines(sort.key);
    const sorted = [...lines].sort((a, b) => compare(a, b) || a.staffName.localeCompare(b.staffName));
    return sort.direction === 'ascending' ? sorted : sorted.reverse();
  }, [lines, sort]);
  const totals = useMemo(() => totalsOf(lines), [lines]);
  const flagged = useMemo(() => lines.filter((line) => flagsOf(line).length > 0).length, [lines]);

  const sortBy = (key: SortKey, direction?: Sort['direction']) =>
    setSort((current) => ({ key, direction: direction ?? (current?.key === key && current.direction === 'ascending' ? 'descending' : 'ascending') }));

  const header = ({ key, label, figure }: ColumnSpec) => {
    const sorted = sort?.key === key ? sort.direction : null;
    return () => (
      <ColumnHeaderCell
        name={label}
        menuIcon={<ChevronDownIcon />}
        nameRenderer={() => (
          <button
            type="button"
            className={`tr-review-sort${figure ? ' tr-figure' : ''}`}
            onClick={() => sortBy(key)}
            aria-label={`Sort by ${label}${sorted ? `, now ${sorted}` : ''}`}
          >
            {label}
            {sorted === 'ascending' && <SortAscIcon size={12} />}
            {sorted === 'descending' && <SortDescIcon size={12} />}
          </button>
        )}
        menuRenderer={() => (
          <Menu aria-label={`Sort by ${label}`}>
            <MenuItem icon={<SortAscIcon />} text="Sort ascending" onClick={() => sortBy(key, 'ascending')} />
            <MenuItem icon={<SortDescIcon />} text="Sort descending" onClick={() => sortBy(key, 'descending')} />
            {sort && <MenuItem text="Original order (branch, name)" onClick={() => setSort(null)} />}
          </Menu>
        )}
      />
    );
  };

  const cell = ({ key, figure }: ColumnSpec) =>
    function renderCell(rowIndex: number) {
      const line = rows[rowIndex];
      const className = [figure && 'tr-figure', !line && 'tr-review-total'].filter(Boolean).join(' ');
      if (!line) {
        if (key === 'staffName') return <Cell className={className}>{`Total · ${lines.length} staff`}</Cell>;
        if (key === 'branchName') return <Cell className={className} />;
        if (key === 'flags') return <Cell className={className}>{flagged === 0 ? 'No flags' : `${flagged} flagged`}</Cell>;
        return <Cell className={className}>{totals[key]}</Cell>;
      }
      if (key === 'staffName')
        return (
          <Cell interactive className="tr-review-name-cell">
            <button type="button" className="tr-review-name" onClick={() => onOpen(line)} aria-label={`${line.staffName}: open the figures`}>
              {line.staffName}
            </button>
          </Cell>
        );
      if (key === 'flags')
        return (
          <Cell interactive>
            <ReviewFlags flags={flagsOf(line)} />
          </Cell>
        );
      return <Cell className={className}>{line[key]}</Cell>;
    };

  const select = (regions: Region[]) => {
    const rowsOf = regions[regions.length - 1]?.rows;
    if (!rowsOf || rowsOf[0] !== rowsOf[1]) return;
    const line = rows[rowsOf[0]];
    if (line) onOpen(line);
  };

  return (
    <section aria-label="Pay lines" className="tr-review">
      <p className="tr-visually-hidden">
        One row per staff member; open a name for every line, tier and workweek behind the figures. Flags: {Object.values(flagLabels).map((f) => f.label).join(', ')}.
      </p>
      <div className={`tr-review-frame ${Classes.ELEVATION_0}`} style={{ height: Math.min(HEADER_HEIGHT + ROW_HEIGHT * (rows.length + 1) + 18, 620) }}>
        <Table2
          numRows={rows.length + 1}
          numFrozenColumns={1}
          enableRowHeader={false}
          enableMultipleSelection={false}
          selectionModes={SelectionModes.ROWS_AND_CELLS}
          onSelection={select}
          defaultRowHeight={ROW_HEIGHT}
          columnWidths={columns.map((column) => column.width)}
          cellRendererDependencies={[rows, sort, totals]}
          rowHeights={Array.from({ length: rows.length + 1 }, () => ROW_HEIGHT)}
        >
          {columns.map((spec) => (
            <Column key={spec.key} id={spec.key} name={spec.label} columnHeaderCellRenderer={header(spec)} cellRenderer={cell(spec)} />
          ))}
        </Table2>
      </div>
      <p className="tr-muted tr-review-footnote">Each total adds the figures as shown, each rounded to the cent.</p>
    </section>
  );
}
