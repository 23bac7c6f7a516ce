import type { LevelRow, ServiceRow } from '@tressury/schema';
import type { Sheet } from '../../common/spreadsheet-reader.js';
import type { ServicePriceView } from '../dto/service.view.js';
import type { PriceInput } from '../services.repository.js';
import { flagRepeats, keyRows, type KeyedRow, type PlannedRow } from './import-plan.js';
import { RowReader, sameDecimal } from './row-reader.js';

export const SERVICE_COLUMNS = {
  required: ['name', 'category', 'duration_minutes'],
  optional: ['is_colour'],
} as const;

export const PRICE_HEADING = /^price\s*:\s*(.+)$/i;

export type ServiceWrite = { name: string; category: string; durationMinutes: number; isColour: boolean; prices: PriceInput[] };
export type ExistingService = { row: ServiceRow; prices: ServicePriceView[] };
export type PlannedService = PlannedRow<ServiceWrite, ExistingService>;

/** The service menu upload: one row per service, matched to the menu by name, with a `price:<level>` column per level. */
export class ServiceSheet {
  private constructor(
    private readonly rows: KeyedRow[],
    /** Price column key ("price:Senior", with the level's own spelling) → level. */
    private readonly priceColumns: Map<string, LevelRow>,
  ) {}

  static read(sheet: Sheet, levels: LevelRow[]): ServiceSheet {
    const priceColumns = new Map<string, LevelRow>();
    const key = (heading: string) => {
      const levelName = PRICE_HEADING.exec(heading.trim())?.[1]?.trim().toLowerCase();
      const level = levels.find((candidate) => candidate.name.toLowerCase() === levelName);
      if (!level) return null;
      priceColumns.set(`price:${level.name}`, level);
      return `price:${level.name}`;
    };
    const expected = levels.length > 0 ? levels.map((level) => `price:${level.name}`).join(', ') : 'price:<level name> once levels exist';
    const rows = keyRows(sheet, SERVICE_COLUMNS, { key, expected });
    return new ServiceSheet(rows, priceColumns);
  }

  names(): string[] {
    return [...new Set(this.rows.map((row) => row.values.name ?? '').filter((name) => name !== ''))];
  }

  plan(existing: ExistingService[]): PlannedService[] {
    const byName = new Map(existing.map((service) => [service.row.name, service]));
    const read = this.rows.map(({ row, values }) => {
      const reader = new RowReader(values);
      const name = reader.text('name', 80);
      const current = name === null ? null : (byName.get(name) ?? null);
      return { row, values, key: name, problems: reader.problems, current, write: this.readService(reader, name, current) };
    });
    flagRepeats(read, 'name');
    return read.map(({ row, values, problems, current, write }) => {
      const good = problems.length === 0 ? write : null;
      return {
        row,
        values,
        errors: problems,
        action: !current ? 'create' : good && sameService(current, good) ? 'unchanged' : 'update',
        write: good,
        existing: current,
      };
    });
  }

  private readService(reader: RowReader, name: string | null, current: ExistingService | null): ServiceWrite | null {
    const category = reader.text('category', 40);
    const durationMinutes = reader.wholeNumber('duration_minutes', 1, 720);
    const isColour = reader.has('is_colour') ? reader.flag('is_colour') : (current?.row.isColour ?? false);
    // Levels without a column keep their present price; an empty cell takes the service off that level.
    const prices = new Map((current?.prices ?? []).map((price) => [price.levelId, price.price]));
    for (const [column, level] of this.priceColumns) {
      const price = reader.decimal(column, { min: '0', max: '100000', scale: 2, example: '65.00' });
      if (price === null) prices.delete(level.id);
      else prices.set(level.id, price);
    }
    if (name === null || category === null || durationMinutes === null || isColour === null) return null;
    return { name, category, durationMinutes, isColour, prices: [...prices].map(([levelId, price]) => ({ levelId, price })) };
  }
}

function sameService(current: ExistingService, next: ServiceWrite): boolean {
  const { row } = current;
  if (row.category !== next.category || row.durationMinutes !== next.durationMinutes || row.isColour !== next.isColour) return false;
  if (current.prices.length !== next.prices.length) return false;
  const before = new Map(current.prices.map((price) => [price.levelId, price.price]));
  return next.prices.every((price) => before.has(price.levelId) && sameDecimal(before.get(price.levelId)!, price.price));
}
