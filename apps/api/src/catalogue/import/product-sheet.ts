import { containerUnits, productKinds, type ProductRow } from '@tressury/schema';
import type { Sheet } from '../../common/spreadsheet-reader.js';
import { type ProductFigures, productRuleProblems } from '../product-rules.js';
import { flagRepeats, keyRows, type KeyedRow, type PlannedRow } from './import-plan.js';
import { RowReader, sameDecimal } from './row-reader.js';

export const PRODUCT_COLUMNS = {
  required: ['code', 'name', 'kind', 'container_size', 'container_unit', 'container_cost'],
  optional: ['developer_volume', 'density_g_per_ml', 'retail_price'],
} as const;

const COLUMN_OF: Record<keyof ProductFigures, string> = {
  kind: 'kind',
  developerVolume: 'developer_volume',
  containerSize: 'container_size',
  containerUnit: 'container_unit',
  densityGramsPerMl: 'density_g_per_ml',
  containerCost: 'container_cost',
  retailPrice: 'retail_price',
};

export type ProductWrite = { code: string; name: string; figures: ProductFigures };
export type PlannedProduct = PlannedRow<ProductWrite, ProductRow>;

const kindKey = (value: string) => value.trim().toLowerCase().replace(/[\s-]+/g, '_');
const unitKey = (value: string) => value.trim().toLowerCase().replace(/\s+/g, ' ');

/** The product catalogue upload: one row per product, matched to the catalogue by code. */
export class ProductSheet {
  private constructor(private readonly rows: KeyedRow[]) {}

  static read(sheet: Sheet): ProductSheet {
    return new ProductSheet(keyRows(sheet, PRODUCT_COLUMNS));
  }

  codes(): string[] {
    return [...new Set(this.rows.map((row) => row.values.code ?? '').filter((code) => code !== ''))];
  }

  plan(existing: ProductRow[]): PlannedProduct[] {
    const byCode = new Map(existing.map((product) => [product.code, product]));
    const read = this.rows.map(({ row, values }) => {
      const reader = new RowReader(values);
      const code = reader.text('code', 40);
      const current = code === null ? null : (byCode.get(code) ?? null);
      return { row, values, key: code, problems: reader.problems, current, write: readProduct(reader, code, current) };
    });
    flagRepeats(read, 'code');
    return read.map(({ row, values, problems, current, write }) => {
      const good = problems.length === 0 ? write : null;
      return {
        row,
        values,
        errors: problems,
        action: !current ? 'create' : good && sameProduct(current, good) ? 'unchanged' : 'update',
        write: good,
        existing: current,
      };
    });
  }
}

function readProduct(reader: RowReader, code: string | null, current: ProductRow | null): ProductWrite | null {
  // A column left out of the file keeps the product's present value; an empty cell clears it.
  const optional = (column: string, read: () => string | null, kept: string | null | undefined) => (reader.has(column) ? read() : (kept ?? null));
  const name = reader.text('name', 120);
  const kind = reader.choice('kind', productKinds, kindKey);
  const developerVolume = optional(
    'developer_volume',
    () => reader.decimal('developer_volume', { min: '0', max: '40', scale: 3, example: '20' }),
    current?.developerVolume,
  );
  const containerSize = reader.requiredDecimal('container_size', { min: '0.001', max: '1000000', scale: 3, example: '60' });
  const containerUnit = reader.choice('container_unit', containerUnits, unitKey);
  const densityGramsPerMl = optional(
    'density_g_per_ml',
    () => reader.decimal('density_g_per_ml', { min: '0.1', max: '5', scale: 4, example: '1.02' }),
    current?.densityGramsPerMl,
  );
  const containerCost = reader.requiredDecimal('container_cost', { min: '0', max: '100000', scale: 2, example: '8.00' });
  const retailPrice = optional('retail_price', () => reader.decimal('retail_price', { min: '0', max: '100000', scale: 2, example: '24.00' }), current?.retailPrice);
  if (kind === null || containerSize === null || containerUnit === null || containerCost === null) return null;
  const figures: ProductFigures = { kind, developerVolume, containerSize, containerUnit, densityGramsPerMl, containerCost, retailPrice };
  // A cell already refused for its own format is not blamed again by a rule that ties it to another.
  for (const problem of productRuleProblems(figures, (field) => COLUMN_OF[field])) {
    if (!reader.hasProblem(problem.field)) reader.problems.push(problem);
  }
  return code === null || name === null ? null : { code, name, figures };
}

function sameProduct(current: ProductRow, next: ProductWrite): boolean {
  const { figures } = next;
  return (
    current.name === next.name &&
    current.kind === figures.kind &&
    current.containerUnit === figures.containerUnit &&
    sameDecimal(current.developerVolume, figures.developerVolume) &&
    sameDecimal(current.containerSize, figures.containerSize) &&
    sameDecimal(current.densityGramsPerMl, figures.densityGramsPerMl) &&
    sameDecimal(current.containerCost, figures.containerCost) &&
    sameDecimal(current.retailPrice, figures.retailPrice)
  );
}
