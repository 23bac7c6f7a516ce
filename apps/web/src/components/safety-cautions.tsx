import { Callout, Intent } from '@blueprintjs/core';
import { ShieldIcon } from '@blueprintjs/icons';
import type { ReactNode } from 'react';
import './safety-cautions.css';

/** DESIGN.md §8: the usual cautions wherever colour formulas or bowls are shown, in one compact panel. */
export function SafetyCautions({ patchTest }: { patchTest?: ReactNode }) {
  return (
    <Callout intent={Intent.WARNING} icon={<ShieldIcon />} title="Safety with colour" className="tr-safety" role="note" aria-label="Safety with colour">
      <ul className="tr-safety-list">
        <li>
          <strong>Patch test before colour</strong> — common practice is a skin test 48 hours ahead.{patchTest ? <> {patchTest}</> : null}
        </li>
        <li>
          <strong>Eyes</strong> — keep colour and lightener away from them; never colour eyelashes or eyebrows with hair colour.
        </li>
        <li>
          <strong>Gloves</strong> — for mixing, applying and rinsing.
        </li>
        <li>
          <strong>Ventilation</strong> — mix peroxide developer and lightener where the air moves.
        </li>
      </ul>
      <p className="tr-safety-note">Licensed practice, the maker’s directions and local codes govern.</p>
    </Callout>
  );
}
