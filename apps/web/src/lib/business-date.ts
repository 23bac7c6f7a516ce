const dateFormatters = new Map<string, Intl.DateTimeFormat>();

/** The calendar date (YYYY-MM-DD) now in a branch's time zone: its business date, as the API counts it. */
export function businessDateIn(timeZone: string, instant: Date = new Date()): string {
  let formatter = dateFormatters.get(timeZone);
  if (!formatter) {
    // en-CA writes YYYY-MM-DD.
    formatter = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    dateFormatters.set(timeZone, formatter);
  }
  return formatter.format(instant);
}

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

export const isBusinessDate = (value: string | null): value is string => value !== null && ISO_DATE.test(value) && !Number.isNaN(Date.parse(value));

/** "2026-12-01" → "Tue, Dec 1, 2026": a business date is already local, so it is read as a calendar day. */
export function businessDateText(date: string): string {
  return new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', weekday: 'short', month: 'short', day: 'numeric', year: 'numeric' }).format(
    new Date(`${date}T12:00:00Z`),
  );
}

/** A moment shown as the clock on the branch's wall, e.g. "5:54 PM". */
export function branchTimeText(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat(undefined, { timeZone, hour: 'numeric', minute: '2-digit' }).format(new Date(iso));
}

type BranchOfMine = { id: string; name: string; timeZone: string };

export type BranchDay<B extends BranchOfMine> = { branch: B; date: string; today: string };

/**
 * The branch and business date a page asks for with `?branch=&date=`: one of the person's branches
 * (the first when none is named) and a day no later than that branch's today (today when none is named).
 */
export function chooseBranchDay<B extends BranchOfMine>(branches: B[], search: URLSearchParams): BranchDay<B> | null {
  const branch = branches.find((b) => b.id === search.get('branch')) ?? branches[0];
  if (!branch) return null;
  const today = businessDateIn(branch.timeZone);
  const asked = search.get('date');
  const date = isBusinessDate(asked) && asked <= today ? asked : today;
  return { branch, date, today };
}
