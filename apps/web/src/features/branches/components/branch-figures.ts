import { parseDecimal } from '@tressury/domain';

/** "0.0825" → "8.25": the stored fraction as a percentage, exactly (no float on the way). */
export function percentText(fraction: string): string | null {
  try {
    return parseDecimal(fraction.trim(), 'retailTaxRate').times(100).toFixed();
  } catch {
    return null;
  }
}
