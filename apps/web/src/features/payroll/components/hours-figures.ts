import type { StaffMember, TimesheetEntry } from '../api/timesheet-queries';
import { decimalUnits } from './review-figures';

// The API's rule for a day's hours (SetTimesheetHoursDto): 0 to 24, at most 3 decimals.
const HOURS = /^\d{1,2}(\.\d{1,3})?$/;

/** Why typed hours would be refused, in words for the person typing; null when they are fine. */
export function hoursProblem(typed: string): string | null {
  const value = typed.trim();
  if (value === '') return null;
  if (/^-/.test(value)) return 'Hours cannot be negative.';
  if (!/^\d+(\.\d+)?$/.test(value)) return 'Write hours as a number, such as 7.5.';
  if (!HOURS.test(value) && /\.\d{4,}$/.test(value)) return 'Use at most 3 decimals.';
  if (!HOURS.test(value) || decimalUnits(value) > decimalUnits('24')) return 'A day holds at most 24 hours.';
  return null;
}

/** Typed hours as the API takes them: "" clears the day ("0"); "07.50" → "7.5". */
export function hoursValue(typed: string): string {
  const value = typed.trim();
  if (value === '') return '0';
  const [whole = '0', fraction = ''] = value.split('.');
  const trimmed = fraction.replace(/0+$/, '');
  return `${BigInt(whole).toString()}${trimmed ? `.${trimmed}` : ''}`;
}

export type GridRow = { staffId: string; staffName: string; hours: Map<string, string> };

/** The branch's people (its staff, and anyone else with hours entered there), each with their hours by day. */
export function gridRows(staff: StaffMember[], entries: TimesheetEntry[], branchId: string): GridRow[] {
  const rows = new Map<string, GridRow>();
  for (const member of staff) {
    if (member.active) rows.set(member.id, { staffId: member.id, staffName: member.displayName, hours: new Map() });
  }
  for (const entry of entries) {
    if (entry.branchId !== branchId) continue;
    const row = rows.get(entry.staffId) ?? { staffId: entry.staffId, staffName: entry.staffName, hours: new Map() };
    // A day cleared to 0 shows as empty, like a day never entered.
    if (decimalUnits(entry.hours) !== 0n) row.hours.set(entry.date, entry.hours);
    rows.set(entry.staffId, row);
  }
  return [...rows.values()].sort((a, b) => a.staffName.localeCompare(b.staffName));
}

// OWASP "CSV Injection": text a spreadsheet could take for a formula starts with an apostrophe.
const csvField = (value: string) => `"${(/^[=+\-@\t\r]/.test(value) ? `'${value}` : value).replaceAll('"', '""')}"`;

/** A filled-in timesheet to edit and upload again: one row per person and day up to today. */
export function timesheetTemplate(rows: GridRow[], branchId: string, days: string[]): string {
  const lines = [['staff_id', 'staff_name', 'branch_id', 'date', 'hours'].join(',')];
  for (const row of rows) {
    for (const day of days) lines.push([row.staffId, row.staffName, branchId, day, row.hours.get(day) ?? '0'].map(csvField).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}
