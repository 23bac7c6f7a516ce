import { Intent } from '@blueprintjs/core';
import { patchTestStatus } from '@tressury/domain';
import { businessDateIn } from '../../../lib/business-date';
import type { BranchWindow, Client, PatchTest } from '../api/client-queries';

type Status = PatchTest['status'];

/** Each state in words, so the tag's colour is never the only sign of it. */
export const patchTestStates: Record<Status, { label: string; intent: Intent }> = {
  current: { label: 'Covers colour', intent: Intent.SUCCESS },
  'too-recent': { label: 'Under 48 hours', intent: Intent.WARNING },
  expired: { label: 'Out of date', intent: Intent.WARNING },
  none: { label: 'None on record', intent: Intent.WARNING },
};

/**
 * The state of a listed client's last test today at their home branch, by the same rule the API applies
 * (libs/domain); null when the home branch's window is not known to this person.
 */
export function listedPatchTestStatus(client: Client, windows: BranchWindow[], instant: Date = new Date()): Status | null {
  if (client.lastPatchTestOn === null) return 'none';
  const branch = windows.find((w) => w.id === client.homeBranchId);
  if (!branch) return null;
  return patchTestStatus({ lastPatchTestOn: client.lastPatchTestOn, onDate: businessDateIn(branch.timeZone, instant), maxAgeDays: branch.patchTestMaxAgeDays })
    .status;
}
