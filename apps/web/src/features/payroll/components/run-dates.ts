const formats = {
  day: new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', weekday: 'short', month: 'short', day: 'numeric' }),
  dayOfYear: new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', month: 'short', day: 'numeric', year: 'numeric' }),
  monthDay: new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', month: 'short', day: 'numeric' }),
};

// Pay dates are calendar days already (YYYY-MM-DD), so they are read at noon UTC and never shift a day.
const calendarDay = (date: string) => new Date(`${date}T12:00:00Z`);

/** "2026-03-03" → "Tue, Mar 3". */
export const dayText = (date: string): string => formats.day.format(calendarDay(date));

/** "Mar 2 – Mar 15, 2026" (both years when they differ). */
export function periodText(startDate: string, endDate: string): string {
  const sameYear = startDate.slice(0, 4) === endDate.slice(0, 4);
  const start = (sameYear ? formats.monthDay : formats.dayOfYear).format(calendarDay(startDate));
  return `${start} – ${formats.dayOfYear.format(calendarDay(endDate))}`;
}

/** Every calendar day from start to end inclusive. */
export function daysOf(startDate: string, endDate: string): string[] {
  const days: string[] = [];
  for (let day = Date.parse(`${startDate}T00:00:00Z`), end = Date.parse(`${endDate}T00:00:00Z`); day <= end; day += 86_400_000) {
    days.push(new Date(day).toISOString().slice(0, 10));
  }
  return days;
}

/** A moment as the wall clock shows it in the given time zone, e.g. "Mar 16, 2026, 9:05 AM". */
export const momentText = (iso: string, timeZone: string): string =>
  new Intl.DateTimeFormat(undefined, { timeZone, month: 'short', day: 'numeric', year: 'numeric', hour: 'numeric', minute: '2-digit' }).format(new Date(iso));

export const weekdayNames = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'] as const;
