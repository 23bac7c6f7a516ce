import { type Bowl, type BowlCost, type BowlProductKind, bowlPartOfProductKind, costBowl, isBowlProductKind, developerPercent, DomainError, toRecordedGrams } from '@tressury/domain';
import type { Product } from '../api/picker-queries';
import { typedDecimal } from './figures';

export type MassUnit = 'g' | 'oz';
export type ComponentRow = { key: string; productId: string; amount: string; unit: MassUnit };

export const bowlProductKinds = Object.keys(bowlPartOfProductKind) as BowlProductKind[];

export const isBowlProduct = (product: Product): boolean => product.active && product.kind !== 'retail';

export type LiveBowl = {
  /** Per row: the grams as they will be recorded (ounces converted), or why the amount cannot be read. */
  rows: { grams: string | null; problem: string | null }[];
  figures: BowlCost | null;
  /** Percent hydrogen peroxide of the mixed developer strength. */
  developerPercent: string | null;
  leftoverProblem: string | null;
};

/** The bowl's figures while it is typed, with the same libs/domain code the API records it with. */
export function liveBowl(rows: ComponentRow[], products: Map<string, Product>, leftoverGrams: string): LiveBowl {
  const parts: Bowl['components'] = [];
  const read = rows.map((row) => {
    if (row.amount.trim() === '') return { grams: null, problem: null };
    const amount = typedDecimal(row.amount);
    if (amount === null || amount.startsWith('-')) return { grams: null, problem: 'Write the amount as a number, such as 30 or 1.5.' };
    const grams = toRecordedGrams(amount, row.unit);
    const product = products.get(row.productId);
    if (product && isBowlProductKind(product.kind)) {
      parts.push({
        productId: product.id,
        kind: bowlPartOfProductKind[product.kind],
        grams,
        costPerGram: product.costPerGram,
        volume: product.kind === 'developer' ? (product.developerVolume ?? '0') : undefined,
      });
    }
    return { grams, problem: null };
  });

  let leftover = '0';
  let leftoverProblem: string | null = null;
  if (leftoverGrams.trim() !== '') {
    const typed = typedDecimal(leftoverGrams);
    if (typed === null || typed.startsWith('-')) leftoverProblem = 'Write the leftover in grams, such as 12 or 4.5.';
    else leftover = typed;
  }
  if (parts.length === 0) return { rows: read, figures: null, developerPercent: null, leftoverProblem };

  try {
    const figures = costBowl({ components: parts, leftoverGrams: leftover });
    return { rows: read, figures, developerPercent: figures.developerVolume === null ? null : developerPercent(figures.developerVolume), leftoverProblem };
  } catch (error) {
    if (error instanceof DomainError && error.field === 'leftoverGrams') {
      const figures = costBowl({ components: parts });
      return {
        rows: read,
        figures,
        developerPercent: figures.developerVolume === null ? null : developerPercent(figures.developerVolume),
        leftoverProblem: `The leftover cannot be more than the ${figures.totalGrams} g mixed.`,
      };
    }
    throw error;
  }
}
