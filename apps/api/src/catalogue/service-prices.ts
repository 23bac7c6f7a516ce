import type { FieldProblem } from '../common/validation-failed.error.js';
import type { PriceInput } from './services.repository.js';

/** Each price names a level of the organisation, and no level twice. */
export function priceProblems(prices: PriceInput[], levelIds: ReadonlySet<string>): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const seen = new Set<string>();
  prices.forEach((price, i) => {
    const field = `prices[${i}].levelId`;
    if (!levelIds.has(price.levelId)) problems.push({ field, message: `${field} is not a level of this organisation` });
    else if (seen.has(price.levelId)) problems.push({ field, message: `${field} names a level that is already priced` });
    seen.add(price.levelId);
  });
  return problems;
}
