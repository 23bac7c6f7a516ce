import type { StaffRow } from '@tressury/schema';

/** A staff row with the names it points to, as the repository reads it. */
export type StaffViewRow = StaffRow & { levelName: string; homeBranchName: string; userId: string | null };

export class StaffView {
  id: string;
  displayName: string;
  email: string | null;
  levelId: string;
  levelName: string;
  homeBranchId: string;
  homeBranchName: string;
  /** The sign-in linked to this staff member (a stylist's own), or null. */
  userId: string | null;
  active: boolean;
  /**
   * Hourly rate paid on top of commission (decimal string), or null for none. A pay figure: present only
   * for callers who may see this person's pay (owner, accountant, a manager of their branch, the person themself).
   */
  hourlyRate?: string | null;
  createdAt: string;
  updatedAt: string;
}

export function toStaffView(row: StaffViewRow, showPay: boolean): StaffView {
  return {
    id: row.id,
    displayName: row.displayName,
    email: row.email,
    levelId: row.levelId,
    levelName: row.levelName,
    homeBranchId: row.homeBranchId,
    homeBranchName: row.homeBranchName,
    userId: row.userId,
    active: row.active,
    ...(showPay ? { hourlyRate: row.hourlyRate } : {}),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
