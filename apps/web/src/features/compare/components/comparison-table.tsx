import { Button, Classes, Collapse, FormGroup, HTMLSelect, Tooltip } from '@blueprintjs/core';
import { ArrowDownIcon, ArrowUpIcon, ChevronDownIcon, ChevronRightIcon, DoubleCaretVerticalIcon } from '@blueprintjs/icons';
import { Cell, Column, ColumnHeaderCell, SelectionModes, Table2 } from '@blueprintjs/table';
import { useMemo, useState } from 'react';
import { Link } from 'react-router';
import '@blueprintjs/table/lib/css/table.css';
import type { BranchFigures } from '../api/compare-queries';
import { type FigureColumn, figureColumns, figureText, type Glossary, labelOf, NO_FIGURE, type SortOrder, sortRows } from './figure-columns';

type Props = {
  rows: BranchFigures[];
  totals: BranchFigures;
  /** The API's heading and definition of each figure, shown on its column header. */
  glossary: Glossary;
  /** The drill-down address of a branch. */
  branchHref: (branchId: string) => string;
};

const ROW_HEIGHT = 30;
const HEADER_HEIGHT = 52;
const NAME_WIDTH = 150;
const SCROLLBAR_ROOM = 18;

const directionText = (order: SortOrder) =>
  order.key === 'branchName' ? (order.direction === 'ascending' ? 'A to Z' : 'Z to A') : order.direction === 'ascending' ? 'lowest first' : 'highest first';

/** One row per branch and a totals row that stays last whatever the order; click a header, or use the sort controls. */
export function ComparisonTable({ rows, totals, glossary, branchHref }: Props) {
  const label = (column: FigureColumn) => labelOf(column.key, column.label, glossary);
  const [order, setOrder] = useState<SortOrder>({ key: 'branchName', direction: 'ascending' });
  const sorted = useMemo(() => sortRows(rows, order), [rows, order]);
  const lines = useMemo(() => [...sorted, totals], [sorted, totals]);
  const isTotals = (index: number) => index === lines.length - 1;

  // A first click sorts figures highest first (what an owner usually looks for) and names A to Z.
  const sortBy = (key: SortOrder['key']) =>
    setOrder((current) =>
      current.key === key
        ? { key, direction: current.direction === 'ascending' ? 'descending' : 'ascending' }
        : { key, direction: key === 'branchName' ? 'ascending' : 'descending' },
    );

  const header = (key: SortOrder['key'], label: string, definition?: string) => () => (
    <ColumnHeaderCell
      className="tr-compare-header"
      nameRenderer={() => <HeaderName label={label} definition={definition} active={order.key === key ? order.direction : null} onSort={() => sortBy(key)} />}
    />
  );

  const nameCell = (index: number) => {
    const row = lines[index] as BranchFigures;
    if (isTotals(index) || row.branchId === null) return <Cell className="tr-compare-totals tr-compare-name">{row.branchName}</Cell>;
    return (
      <Cell interactive className="tr-compare-name">
        <Link to={branchHref(row.branchId)} aria-label={`${row.branchName}: days and stylists`}>
          {row.branchName}
        </Link>
      </Cell>
    );
  };

  const figureCell = (column: FigureColumn) => (index: number) => {
    const row = lines[index] as BranchFigures;
    const text = figureText(column, row);
    const why = text === NO_FIGURE && column.missing ? `${row.branchName}: ${column.missing}.` : undefined;
    return (
      <Cell className={isTotals(index) ? 'tr-compare-figure tr-compare-totals' : 'tr-compare-figure'} tooltip={why}>
        {text}
      </Cell>
    );
  };

  const sortedColumn = figureColumns.find((c) => c.key === order.key);
  const sortedBy = sortedColumn ? label(sortedColumn) : 'branch name';
  // Room for the rows and a horizontal scroll bar, so the table never scrolls up and down.
  const height = HEADER_HEIGHT + lines.length * ROW_HEIGHT + SCROLLBAR_ROOM;

  return (
    <div className="tr-compare-table">
      <div className="tr-compare-toolbar">
        <FormGroup label="Sort by" labelFor="compare-sort" inline className="tr-compare-sort-by">
          <HTMLSelect id="compare-sort" value={order.key} onChange={(event) => sortBy(event.currentTarget.value as SortOrder['key'])}>
            <option value="branchName">Branch name</option>
            {figureColumns.map((column) => (
              <option key={column.key} value={column.key}>
                {label(column)}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        <Button
          size="small"
          icon={order.direction === 'ascending' ? <ArrowUpIcon /> : <ArrowDownIcon />}
          text={directionText(order)}
          aria-label={`Order: ${directionText(order)}. Reverse it`}
          onClick={() => setOrder({ key: order.key, direction: order.direction === 'ascending' ? 'descending' : 'ascending' })}
        />
        <span className="tr-muted">The totals row stays last. {figureColumns.length} figures: scroll the table sideways for all of them.</span>
        <span className="tr-visually-hidden" aria-live="polite">
          Sorted by {sortedBy}, {directionText(order)}.
        </span>
      </div>
      <div className="tr-table-frame" style={{ height }} role="region" aria-label="Branch figures">
        <Table2
          numRows={lines.length}
          numFrozenColumns={1}
          enableRowHeader={false}
          selectionModes={SelectionModes.NONE}
          defaultRowHeight={ROW_HEIGHT}
          columnWidths={[NAME_WIDTH, ...figureColumns.map((c) => c.width)]}
          cellRendererDependencies={[lines]}
        >
          {[
            <Column key="branchName" id="branchName" columnHeaderCellRenderer={header('branchName', 'Branch')} cellRenderer={nameCell} />,
            ...figureColumns.map((column) => (
              <Column
                key={column.key}
                id={column.key}
                columnHeaderCellRenderer={header(column.key, label(column), glossary.get(column.key)?.definition)}
                cellRenderer={figureCell(column)}
              />
            )),
          ]}
        </Table2>
      </div>
      <p className="tr-muted tr-compare-pay-note">
        Commission cost and product charge recovered come from approved payroll runs: they follow the configured pay rules and are to be
        confirmed by a payroll professional.
      </p>
      <MissingFigures lines={lines} label={label} />
      <Definitions glossary={glossary} label={label} />
    </div>
  );
}

// Table2 draws its headers more than once (its frozen quadrants), so they are for the mouse only: the sort
// controls above the table and the definitions below it are the keyboard's and screen reader's way in.
function HeaderName({ label, definition, active, onSort }: { label: string; definition?: string; active: SortOrder['direction'] | null; onSort: () => void }) {
  const icon = active === 'ascending' ? <ArrowUpIcon /> : active === 'descending' ? <ArrowDownIcon /> : <DoubleCaretVerticalIcon className={Classes.TEXT_MUTED} />;
  const button = (
    <Button variant="minimal" size="small" className="tr-compare-sort" endIcon={icon} onClick={onSort} tabIndex={-1} aria-hidden>
      <span className="tr-compare-header-label">{label}</span>
    </Button>
  );
  if (!definition) return button;
  return (
    <Tooltip content={<span className="tr-compare-definition">{definition}</span>} placement="bottom" hoverOpenDelay={250} compact>
      {button}
    </Tooltip>
  );
}

/** The figures' definitions as the API words them, in one list that a keyboard or screen reader reaches. */
function Definitions({ glossary, label }: { glossary: Glossary; label: (column: FigureColumn) => string }) {
  const [open, setOpen] = useState(false);
  const defined = figureColumns.filter((column) => glossary.has(column.key));
  if (defined.length === 0) return null;
  return (
    <div className="tr-compare-definitions">
      <Button variant="minimal" size="small" icon={open ? <ChevronDownIcon /> : <ChevronRightIcon />} aria-expanded={open} aria-controls="compare-definitions" onClick={() => setOpen(!open)}>
        What the figures mean
      </Button>
      <Collapse isOpen={open}>
        <dl id="compare-definitions" className="tr-definition-list">
          {defined.map((column) => (
            <div key={column.key}>
              <dt>{label(column)}</dt>
              <dd>{glossary.get(column.key)?.definition}</dd>
            </div>
          ))}
        </dl>
      </Collapse>
    </div>
  );
}

/** Every dash in the table, said in words, so a missing figure is never a puzzle. */
function MissingFigures({ lines, label }: { lines: BranchFigures[]; label: (column: FigureColumn) => string }) {
  const notes: string[] = [];
  for (const column of figureColumns) {
    if (!column.missing) continue;
    const without = lines.filter((row) => row[column.key] === null && row.branchId !== null);
    const totalsWithout = lines.some((row) => row.branchId === null && row[column.key] === null);
    if (without.length > 0) notes.push(`${label(column)} for ${without.map((row) => row.branchName).join(', ')}: ${column.missing}.`);
    else if (totalsWithout) notes.push(`${label(column)} for all branches: ${column.missing}.`);
  }
  if (notes.length === 0) return null;
  return (
    <div className="tr-compare-missing">
      <p className="tr-muted">A dash ({NO_FIGURE}) marks a figure that cannot be worked out:</p>
      <ul aria-label="Why some figures are missing">
        {notes.map((note) => (
          <li key={note}>{note}</li>
        ))}
      </ul>
    </div>
  );
}
