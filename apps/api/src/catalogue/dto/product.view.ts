import type { ContainerUnitName, ProductKind, ProductRow } from '@tressury/schema';
import Big from 'big.js';

// numeric columns come back padded to their scale ("1000.000"); sizes and volumes read better without it.
const plain = (value: string): string => new Big(value).toFixed();
const plainOrNull = (value: string | null): string | null => (value === null ? null : plain(value));

export class ProductView {
  id: string;
  /** The organisation's own product code, unique in the organisation. */
  code: string;
  name: string;
  kind: ProductKind;
  /** Developer strength in volumes ("20"); null for every other kind. */
  developerVolume: string | null;
  /** Amount in one container, decimal string, in `containerUnit`. */
  containerSize: string;
  containerUnit: ContainerUnitName;
  /** Grams per millilitre, for products sold by volume; null when not known. */
  densityGramsPerMl: string | null;
  /** What the salon pays for one container, decimal string. */
  containerCost: string;
  /** Shelf price for retail sale; null when the product is not sold over the counter. */
  retailPrice: string | null;
  /** Cost of one gram to 6 decimals, derived from the container (never entered). */
  costPerGram: string;
  /** True when a volume had no density and 1 g per mL was assumed: show the figure as approximate. */
  costPerGramApproximate: boolean;
  active: boolean;
  createdAt: string;
  updatedAt: string;
}

export function toProductView(row: ProductRow): ProductView {
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    kind: row.kind,
    developerVolume: plainOrNull(row.developerVolume),
    containerSize: plain(row.containerSize),
    containerUnit: row.containerUnit,
    densityGramsPerMl: plainOrNull(row.densityGramsPerMl),
    containerCost: row.containerCost,
    retailPrice: row.retailPrice,
    costPerGram: row.costPerGram,
    costPerGramApproximate: row.costPerGramApproximate,
    active: row.active,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
