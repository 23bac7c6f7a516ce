import { parseDecimal } from '@tressury/domain';

/** Thousands grouped by commas, decimals untouched: "48213.50" → "48,213.50" (text in, text out, no float). */
export function groupedText(value: string): string {
  const [whole = '', decimals] = value.split('.');
  const sign = whole.startsWith('-') ? '-' : '';
  const digits = sign ? whole.slice(1) : whole;
  const grouped = digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${sign}${grouped}${decimals === undefined ? '' : `.${decimals}`}`;
}

/** A decimal fraction as a percentage with one decimal, half-up: "0.18345" → "18.3 %". */
export function percentText(fraction: string): string {
  return `${parseDecimal(fraction, 'fraction').times(100).toFixed(1)} %`;
}

export const countText = (value: number): string => groupedText(String(value));

/** Orders decimal strings by value, exactly. */
export const compareDecimals = (a: string, b: string): number => parseDecimal(a, 'a').cmp(parseDecimal(b, 'b'));

/** "2026-09-01" → "Sep 1, 2026"; a business date is a calendar day, read as such. */
export function shortDateText(date: string, withYear = true): string {
  return new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', month: 'short', day: 'numeric', ...(withYear ? { year: 'numeric' } : {}) }).format(
    new Date(`${date}T12:00:00Z`),
  );
}

/** "Sep 1 – Nov 29, 2026", or with both years when the range crosses one. */
export function rangeText(from: string, to: string): string {
  if (from === to) return shortDateText(from);
  const sameYear = from.slice(0, 4) === to.slice(0, 4);
  return `${shortDateText(from, !sameYear)} – ${shortDateText(to)}`;
}

/** "2026-11" → "November 2026". */
export function monthText(month: string): string {
  return new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', month: 'long', year: 'numeric' }).format(new Date(`${month}-15T12:00:00Z`));
}

/** A rate as the percentage it is, exactly, with no rounding: "0.055" → "5.5 %". */
export function rateText(fraction: string): string {
  return `${parseDecimal(fraction, 'rate').times(100).toFixed()} %`;
}
