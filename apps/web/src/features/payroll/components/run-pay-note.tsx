import { Callout } from '@blueprintjs/core';
import { InfoSignIcon } from '@blueprintjs/icons';

/** DESIGN.md §8: every screen with pay figures says whose rules they follow and who confirms them. */
export function RunPayNote() {
  return (
    <Callout icon={<InfoSignIcon />} className="tr-pay-note" role="note" aria-label="About these figures">
      These figures follow the pay rules configured in Tressury (plans, branch minimum wage and overtime settings). Local law governs: have them confirmed by a payroll
      professional before paying.
    </Callout>
  );
}
