import { parseDecimal } from '@tressury/domain';

const moneyFormats = new Map<string, Intl.NumberFormat>();

/** A decimal string as money in the branch's currency, exactly: Intl formats the string itself, never a float. */
export function moneyText(value: string, currency: string): string {
  let format = moneyFormats.get(currency);
  if (!format) {
    format = new Intl.NumberFormat(undefined, { style: 'currency', currency });
    moneyFormats.set(currency, format);
  }
  return format.format(value as Intl.StringNumericLiteral);
}

/** A rate as the percentage it is, with no rounding: "0.45" → "45 %". */
export const rateText = (fraction: string): string => `${parseDecimal(fraction, 'rate').times(100).toFixed()} %`;

/** Whether a money figure is above zero, read exactly. */
export const isPositive = (value: string): boolean => parseDecimal(value, 'value').gt(0);

const formats = {
  day: new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', weekday: 'short', month: 'short', day: 'numeric' }),
  shortDay: new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', month: 'short', day: 'numeric' }),
  dayOfYear: new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', month: 'short', day: 'numeric', year: 'numeric' }),
};

// Business dates are calendar days already (YYYY-MM-DD), read at noon UTC so they never shift a day.
const calendarDay = (date: string) => new Date(`${date}T12:00:00Z`);

/** "2026-03-03" → "Tue, Mar 3". */
export const dayText = (date: string): string => formats.day.format(calendarDay(date));

/** "2026-03-03" → "Mar 3", for chart axes. */
export const shortDayText = (date: string): string => formats.shortDay.format(calendarDay(date));

/** "Mar 2 – Mar 15, 2026" (both years when they differ). */
export function periodText(startDate: string, endDate: string): string {
  const sameYear = startDate.slice(0, 4) === endDate.slice(0, 4);
  const start = (sameYear ? formats.shortDay : formats.dayOfYear).format(calendarDay(startDate));
  return `${start} – ${formats.dayOfYear.format(calendarDay(endDate))}`;
}
