import type { TimesheetEntryRow } from '@tressury/schema';
import Big from 'big.js';

export class TimesheetEntryView {
  id: string;
  staffId: string;
  staffName: string;
  branchId: string;
  date: string;
  /** Decimal string. */
  hours: string;
  updatedAt: string;
}

export const toTimesheetEntryView = (row: TimesheetEntryRow & { staffName: string }): TimesheetEntryView => ({
  id: row.id,
  staffId: row.staffId,
  staffName: row.staffName,
  branchId: row.branchId,
  date: row.workDate,
  hours: new Big(row.hours).toFixed(),
  updatedAt: row.updatedAt.toISOString(),
});
