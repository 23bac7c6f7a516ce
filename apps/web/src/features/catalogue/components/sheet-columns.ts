import type { Level, Product, Service } from '../api/catalogue-queries';
import type { SheetKind } from '../api/send-sheet';

export type SheetColumn = { heading: string; required: boolean; note: string };

// The headings the API reads, from its OpenAPI description of POST /api/catalogue/{products,services}/import.
export const productColumns: SheetColumn[] = [
  { heading: 'code', required: true, note: 'Your product code; a known code updates that product, a new one adds it.' },
  { heading: 'name', required: true, note: '' },
  { heading: 'kind', required: true, note: 'permanent, demi_permanent, lightener, developer, treatment or retail.' },
  { heading: 'container_size', required: true, note: 'How much one container holds.' },
  { heading: 'container_unit', required: true, note: 'g, oz, mL or fl oz.' },
  { heading: 'container_cost', required: true, note: 'What one container costs the salon.' },
  { heading: 'developer_volume', required: false, note: 'Developers only, 0 to 40.' },
  { heading: 'density_g_per_ml', required: false, note: 'For products sold by volume.' },
  { heading: 'retail_price', required: false, note: 'Needed for retail products.' },
];

export function serviceColumns(levels: Level[]): SheetColumn[] {
  return [
    { heading: 'name', required: true, note: 'A known name updates that service, a new one adds it.' },
    { heading: 'category', required: true, note: '' },
    { heading: 'duration_minutes', required: true, note: 'Whole minutes, 1 to 720.' },
    { heading: 'is_colour', required: false, note: 'yes or no; empty is no.' },
    ...levels.map((level) => ({ heading: `price:${level.name}`, required: false, note: `Price at ${level.name}; an empty cell takes the service off that level.` })),
  ];
}

export const sheetRules: Record<SheetKind, string[]> = {
  products: [
    'An optional column left out of the file keeps each product’s current value; an empty cell clears it.',
    'Cost per gram is worked out by Tressury, never read from the file.',
  ],
  services: [
    'A level without a price column keeps each service’s current price at that level.',
    'Leaving out is_colour keeps each service’s current setting.',
  ],
};

// STACK.md: a spreadsheet runs a cell starting with = + - @ (or a tab or line break) as a formula; a leading ' keeps it text.
const quoted = (value: string): string => {
  const safe = /^[=+\-@\t\r\n]/.test(value) ? `'${value}` : value;
  return `"${safe.replaceAll('"', '""')}"`;
};

const csvOf = (rows: string[][]): string => `${rows.map((row) => row.map(quoted).join(',')).join('\r\n')}\r\n`;

/** The headings and today's active products: edit it in a spreadsheet and upload it again. */
export function productTemplate(products: Product[]): string {
  const rows = products
    .filter((p) => p.active)
    .map((p) => [p.code, p.name, p.kind, p.containerSize, p.containerUnit, p.containerCost, p.developerVolume ?? '', p.densityGramsPerMl ?? '', p.retailPrice ?? '']);
  return csvOf([productColumns.map((c) => c.heading), ...rows]);
}

/** The headings (one price column per level) and today's menu. */
export function serviceTemplate(services: Service[], levels: Level[]): string {
  const rows = services
    .filter((s) => s.active)
    .map((s) => [
      s.name,
      s.category,
      String(s.durationMinutes),
      s.isColour ? 'yes' : 'no',
      ...levels.map((level) => s.prices.find((p) => p.levelId === level.id)?.price ?? ''),
    ]);
  return csvOf([serviceColumns(levels).map((c) => c.heading), ...rows]);
}
