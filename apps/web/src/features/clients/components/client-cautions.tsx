import { Callout, H2, Intent, Tag } from '@blueprintjs/core';
import { WarningSignIcon } from '@blueprintjs/icons';
import { businessDateText } from '../../../lib/business-date';
import type { ClientDetail } from '../api/client-queries';
import { patchTestStates } from './patch-test-state';

/** Allergies first and loud: the one thing nobody may miss before touching a client's hair. */
export function AllergyNotes({ notes }: { notes: string }) {
  if (!notes.trim()) return <p className="tr-muted tr-clients-no-allergy">No allergies or sensitivities noted.</p>;
  return (
    <Callout intent={Intent.WARNING} icon={<WarningSignIcon />} title="Allergy notes" className="tr-clients-allergy" role="alert">
      <p className="tr-clients-allergy-text">{notes}</p>
    </Callout>
  );
}

const windowEndLabels: Record<ClientDetail['patchTest']['status'], string> = {
  current: 'Covers colour until',
  'too-recent': 'Window ends',
  expired: 'Window ended',
  none: 'Window ends',
};

function daysAgo(days: number): string {
  if (days === 0) return 'today';
  if (days === 1) return 'yesterday';
  return `${days} days ago`;
}

/** Whether the last patch test covers colour today at the home branch, as the server judged it, with its caution. */
export function PatchTestPanel({ client }: { client: ClientDetail }) {
  const test = client.patchTest;
  const state = patchTestStates[test.status];
  return (
    <section className="tr-panel tr-clients-patch" aria-labelledby="client-patch-test">
      <div className="tr-clients-panel-head">
        <H2 id="client-patch-test" className="tr-panel-title">
          Patch test
        </H2>
        <Tag intent={state.intent} large>
          {state.label}
        </Tag>
      </div>
      <dl className="tr-clients-facts">
        <dt>Last test</dt>
        <dd>
          {client.lastPatchTestOn ? (
            <>
              {businessDateText(client.lastPatchTestOn)}
              {test.ageDays !== null && <span className="tr-muted"> ({daysAgo(test.ageDays)})</span>}
            </>
          ) : (
            <span className="tr-muted">None on record</span>
          )}
        </dd>
        {test.validUntil && (
          <>
            <dt>{windowEndLabels[test.status]}</dt>
            <dd>{businessDateText(test.validUntil)}</dd>
          </>
        )}
        <dt>Window at {client.homeBranchName}</dt>
        <dd>{test.maxAgeDays} days</dd>
      </dl>
      {test.caution && (
        <Callout intent={Intent.WARNING} icon={<WarningSignIcon />} className="tr-clients-caution" role="note" aria-label="Patch test caution">
          {test.caution}
        </Callout>
      )}
    </section>
  );
}
