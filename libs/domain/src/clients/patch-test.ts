import { invalid, readObject } from '../fields.js';
import { formatBusinessDate, parseBusinessDate } from '../pay/business-date.js';

export type PatchTestInput = {
  /** The client's last skin test, YYYY-MM-DD; null when none is on record. */
  lastPatchTestOn: string | null;
  /** The day of the colour service, YYYY-MM-DD (the branch's business date). */
  onDate: string;
  /** The branch setting: how many days a test stays good. */
  maxAgeDays: number;
};

export type PatchTestStatus = {
  /** 'current' covers colour on `onDate`; anything else calls for the caution and an acknowledgement. */
  status: 'current' | 'too-recent' | 'expired' | 'none';
  /** Whole calendar days from the test to `onDate`; negative when the test is dated after it. */
  ageDays: number | null;
  /** The last day the test still covers colour. */
  validUntil: string | null;
};

/**
 * Common practice (US FDA consumer guidance on hair dyes, from memory): a skin test done 48 hours
 * before colouring. Only dates are kept, so the nearest reading is two calendar days.
 */
export const PATCH_TEST_READ_AFTER_DAYS = 2;

const MAX_AGE_LIMIT_DAYS = 36_500;

/** Whether a client's last patch test covers a colour service on `onDate`. */
export function patchTestStatus(input: PatchTestInput): PatchTestStatus {
  const source = readObject(input, '');
  const onDay = parseBusinessDate(source.onDate, 'onDate');
  const maxAgeDays = source.maxAgeDays;
  if (typeof maxAgeDays !== 'number' || !Number.isInteger(maxAgeDays) || maxAgeDays < 0 || maxAgeDays > MAX_AGE_LIMIT_DAYS) {
    throw invalid('maxAgeDays', `maxAgeDays must be a whole number of days from 0 to ${MAX_AGE_LIMIT_DAYS}`);
  }
  if (source.lastPatchTestOn === null) return { status: 'none', ageDays: null, validUntil: null };
  const testDay = parseBusinessDate(source.lastPatchTestOn, 'lastPatchTestOn');
  const ageDays = onDay - testDay;
  const validUntil = formatBusinessDate(testDay + maxAgeDays);
  // A test dated after the service gave no reading before it: too recent, not expired.
  if (ageDays < PATCH_TEST_READ_AFTER_DAYS) return { status: 'too-recent', ageDays, validUntil };
  if (ageDays > maxAgeDays) return { status: 'expired', ageDays, validUntil };
  return { status: 'current', ageDays, validUntil };
}
