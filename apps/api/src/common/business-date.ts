import { TZDate } from '@date-fns/tz';

const formatters = new Map<string, Intl.DateTimeFormat>();

/** The calendar date (YYYY-MM-DD) at `instant` in the branch's IANA time zone: its business date. */
export function businessDateIn(timeZone: string, instant: Date = new Date()): string {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    // en-CA formats as YYYY-MM-DD.
    formatter = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    formatters.set(timeZone, formatter);
  }
  return formatter.format(instant);
}

/** The instants a branch's business date starts and ends (the next local midnight), for the card processor's records. */
export function businessDayBounds(timeZone: string, businessDate: string): { from: Date; to: Date } {
  const [year, month, day] = businessDate.split('-').map(Number) as [number, number, number];
  return {
    from: new Date(new TZDate(year, month - 1, day, timeZone).getTime()),
    to: new Date(new TZDate(year, month - 1, day + 1, timeZone).getTime()),
  };
}
