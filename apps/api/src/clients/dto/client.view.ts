import { patchTestStatus } from '@tressury/domain';
import type { ClientRow } from '@tressury/schema';
import type { ClientBranch } from '../clients.repository.js';

export class ClientView {
  id: string;
  homeBranchId: string;
  homeBranchName: string;
  firstName: string;
  lastName: string;
  phone: string | null;
  email: string | null;
  notes: string;
  /** Known allergies and sensitivities, in the staff's words. */
  allergyNotes: string;
  /** Date (YYYY-MM-DD) of the client's last skin patch test; null when none is on record. */
  lastPatchTestOn: string | null;
  createdAt: string;
  updatedAt: string;
}

/** Whether the last patch test covers colour today at the client's home branch. */
export class PatchTestView {
  /** 'current' covers colour; 'too-recent' (under 48 hours, i.e. two calendar days), 'expired' and 'none' need an acknowledgement. */
  status: 'current' | 'too-recent' | 'expired' | 'none';
  /** Whole days from the test to `onDate`; null without a test. */
  ageDays: number | null;
  /** The last day the test covers colour, by the branch's window; null without a test. */
  validUntil: string | null;
  /** The business date this was worked out for: today in the home branch's time zone. */
  onDate: string;
  /** The home branch's window: days a patch test stays good. */
  maxAgeDays: number;
  /** True when a colour service needs someone to confirm going ahead without a covering test. */
  acknowledgementRequired: boolean;
  /** A plain-language caution to show before colour; null when the test covers it. */
  caution: string | null;
}

export class ClientDetailView extends ClientView {
  patchTest: PatchTestView;
}

export class ClientPageView {
  /** Ordered by last name, then first name. */
  items: ClientView[];
  /** How many clients match, across all pages. */
  total: number;
  limit: number;
  offset: number;
}

export function toClientView(row: ClientRow, homeBranchName: string): ClientView {
  return {
    id: row.id,
    homeBranchId: row.homeBranchId,
    homeBranchName,
    firstName: row.firstName,
    lastName: row.lastName,
    phone: row.phone,
    email: row.email,
    notes: row.notes,
    allergyNotes: row.allergyNotes,
    lastPatchTestOn: row.lastPatchTestOn,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

const CONFIRM = 'Confirm with the client before any colour service; licensed practice and local codes govern.';

// Common practice in salons: a patch test 48 hours before colour.
function cautionFor(status: PatchTestView['status'], lastPatchTestOn: string | null, maxAgeDays: number): string | null {
  switch (status) {
    case 'current':
      return null;
    case 'none':
      return `No patch test is on record; common practice is a patch test 48 hours before colour. ${CONFIRM}`;
    case 'too-recent':
      return `The patch test of ${lastPatchTestOn} has not had 48 hours to read. ${CONFIRM}`;
    case 'expired':
      return `The last patch test (${lastPatchTestOn}) is older than this branch's ${maxAgeDays}-day window. ${CONFIRM}`;
  }
}

export function toPatchTestView(lastPatchTestOn: string | null, branch: ClientBranch, onDate: string): PatchTestView {
  const maxAgeDays = branch.patchTestMaxAgeDays;
  const result = patchTestStatus({ lastPatchTestOn, onDate, maxAgeDays });
  return {
    ...result,
    onDate,
    maxAgeDays,
    acknowledgementRequired: result.status !== 'current',
    caution: cautionFor(result.status, lastPatchTestOn, maxAgeDays),
  };
}

export function toClientDetailView(row: ClientRow, branch: ClientBranch, today: string): ClientDetailView {
  return { ...toClientView(row, branch.name), patchTest: toPatchTestView(row.lastPatchTestOn, branch, today) };
}
