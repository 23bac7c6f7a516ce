const formatters = new Map<string, Intl.DateTimeFormat>();

/** When a message went out, on the clock of the given branch time zone, e.g. "Mar 14, 2026, 5:54 PM CDT". */
export function messageTimeText(iso: string, timeZone: string): string {
  let formatter = formatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat(undefined, { timeZone, month: 'short', day: 'numeric', year: 'numeric', hour: 'numeric', minute: '2-digit', timeZoneName: 'short' });
    formatters.set(timeZone, formatter);
  }
  return formatter.format(new Date(iso));
}

const shortFormatters = new Map<string, Intl.DateTimeFormat>();

/** The same moment for a dense table row, e.g. "Mar 14, 5:54 PM"; the year only when it is not this year's. */
export function messageShortTimeText(iso: string, timeZone: string, now: Date = new Date()): string {
  const year = (instant: Date) => new Intl.DateTimeFormat('en-US', { timeZone, year: 'numeric' }).format(instant);
  const withYear = year(new Date(iso)) !== year(now);
  const key = `${timeZone}|${withYear}`;
  let formatter = shortFormatters.get(key);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat(undefined, { timeZone, month: 'short', day: 'numeric', hour: 'numeric', minute: '2-digit', ...(withYear ? { year: 'numeric' } : {}) });
    shortFormatters.set(key, formatter);
  }
  return formatter.format(new Date(iso));
}

const kindLabels: Record<string, string> = { pay_statement: 'Pay statement' };

export const messageKindText = (kind: string): string => kindLabels[kind] ?? kind.replaceAll('_', ' ');
