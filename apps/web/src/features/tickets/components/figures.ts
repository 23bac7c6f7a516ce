import { parseDecimal } from '@tressury/domain';

/** "6.00" → "6", "20.0" → "20", "4.50" → "4.5": a figure without the zeros that carry nothing (text only, no arithmetic). */
export function plainFigure(value: string): string {
  return value.includes('.') ? value.replace(/0+$/, '').replace(/\.$/, '') : value;
}

/** Developer grams per gram of colour, as the trade writes a mix: "1 : 1.50". */
export const ratioText = (ratio: string | null): string => (ratio === null ? '—' : `1 : ${ratio}`);

/** The sign of a decimal string from the server: -1, 0 or 1. */
export const signOf = (amount: string): number => parseDecimal(amount, 'amount').cmp(0);

/** A decimal the person typed, or null when it is not one ("12", "12.50"). */
export function typedDecimal(text: string): string | null {
  const value = text.trim();
  try {
    parseDecimal(value, 'value');
    return value;
  } catch {
    return null;
  }
}
