import { Callout } from '@blueprintjs/core';
import { InfoSignIcon } from '@blueprintjs/icons';

/** DESIGN.md §8: every screen with pay figures says whose rules they follow and who confirms them. */
export function EarningsPayNote() {
  return (
    <Callout icon={<InfoSignIcon />} role="note" aria-label="About these figures">
      These figures follow the pay rules set up in Tressury for your plan and branch, from closed days only, and can still change until the period’s payroll is
      approved. They are to be confirmed by a payroll professional; local law governs.
    </Callout>
  );
}
