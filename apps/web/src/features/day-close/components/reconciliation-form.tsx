import { Button, Callout, FormGroup, H2, HTMLTable, InputGroup, Intent, SegmentedControl, TextArea } from '@blueprintjs/core';
import { ConfirmIcon } from '@blueprintjs/icons';
import { type FormEvent, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { businessDateText } from '../../../lib/business-date';
import { showToast } from '../../../lib/toaster';
import type { DayPreview } from '../api/day-close-queries';
import { type NewDayClose, useCloseDay } from '../api/use-close-day';
import { cardVarianceOf, type CountMode, denominations, denominationValue, liveCount, varianceText } from './reconciliation';

// The server asks for a note of at least this many characters when a variance is over the threshold.
const NOTE_MIN = 3;

/** The last step of the checklist: count the drawer, compare the card totals, explain a variance, close. */
export function ReconciliationForm({ preview }: { preview: DayPreview }) {
  const close = useCloseDay();
  const [mode, setMode] = useState<CountMode>('total');
  const [total, setTotal] = useState('');
  const [counts, setCounts] = useState<Record<string, string>>({});
  const [note, setNote] = useState('');
  const [noteProblem, setNoteProblem] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);

  const live = liveCount(preview, mode, total, counts);
  const reconciliation = live.state === 'counted' ? live.reconciliation : null;
  const noteRequired = reconciliation?.needsNote ?? false;
  const noteShort = noteRequired && note.trim().length < NOTE_MIN;

  const blockers: string[] = [];
  if (!preview.readyToClose) blockers.push('Finish the checklist above first.');
  if (live.state === 'empty') blockers.push('Count the cash in the drawer.');
  if (live.state === 'problem') blockers.push(live.message);
  if (noteShort) blockers.push('Write a note explaining the variance.');

  let noteHelp = 'Optional: anything the owner should know about this day.';
  if (reconciliation && noteRequired) {
    noteHelp =
      `Required: cash ${varianceText(reconciliation.cashVariance, 'short', 'over')} and card ${varianceText(reconciliation.cardVariance, 'short', 'over')} — ` +
      `more than this branch’s ${preview.varianceNoteThreshold} threshold. Say what happened.`;
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (blockers.length > 0 || !reconciliation) return;
    const body: NewDayClose = {
      branchId: preview.branchId,
      businessDate: preview.businessDate,
      ...(live.state === 'counted' && live.denominations ? { denominations: live.denominations } : { countedCash: reconciliation.countedCash }),
      note: note.trim() || undefined,
    };
    setRefusal(null);
    close.mutate(body, {
      onSuccess: () => void showToast({ intent: Intent.SUCCESS, message: `${preview.branchName} is closed for ${businessDateText(preview.businessDate)}.` }),
      onError: (error) => {
        const onNote = error instanceof ApiError ? error.details.find((d) => d.field === 'note') : undefined;
        if (onNote) setNoteProblem(error instanceof ApiError ? error.message : onNote.message);
        else setRefusal(errorMessage(error));
      },
    });
  };

  const cashVariance = reconciliation ? varianceText(reconciliation.cashVariance, 'short', 'over') : '—';
  const cardVariance = reconciliation ? varianceText(reconciliation.cardVariance, 'short', 'over') : varianceText(cardVarianceOf(preview), 'short', 'over');

  return (
    <section className="tr-panel tr-reconcile" aria-labelledby="day-reconcile">
      <H2 id="day-reconcile" className="tr-panel-title">
        Reconcile and close
      </H2>
      <form onSubmit={submit} noValidate>
        <div className="tr-reconcile-grid">
          <div>
            <SegmentedControl
              aria-label="How the drawer was counted"
              value={mode}
              onValueChange={(value) => setMode(value as CountMode)}
              options={[
                { value: 'total', label: 'One total' },
                { value: 'denominations', label: 'By denomination' },
              ]}
            />
            {mode === 'total' ? (
              <FormGroup
                className="tr-count-total"
                label="Cash counted in the drawer"
                labelFor="counted-cash"
                helperText={live.state === 'problem' ? live.message : undefined}
                intent={live.state === 'problem' ? Intent.DANGER : Intent.NONE}
              >
                <InputGroup id="counted-cash" autoFocus inputMode="decimal" className="tr-figure-input" value={total} onValueChange={setTotal} />
              </FormGroup>
            ) : (
              <HTMLTable compact className="tr-table tr-denominations" aria-label="Cash by denomination">
                <thead>
                  <tr>
                    <th scope="col" className="tr-figure">
                      Face value
                    </th>
                    <th scope="col" className="tr-figure">
                      How many
                    </th>
                    <th scope="col" className="tr-figure">
                      Value
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {denominations.map((face) => (
                    <tr key={face}>
                      <th scope="row" className="tr-figure">
                        {face}
                      </th>
                      <td className="tr-figure">
                        <InputGroup
                          aria-label={`How many ${face}`}
                          inputMode="numeric"
                          size="small"
                          className="tr-figure-input tr-count-input"
                          value={counts[face] ?? ''}
                          intent={live.state === 'problem' && live.field === `denominations.${face}` ? Intent.DANGER : Intent.NONE}
                          onValueChange={(value) => setCounts((current) => ({ ...current, [face]: value }))}
                        />
                      </td>
                      <td className="tr-figure">{denominationValue(face, counts[face] ?? '') ?? ''}</td>
                    </tr>
                  ))}
                </tbody>
              </HTMLTable>
            )}
          </div>
          <dl className="tr-figures tr-reconcile-figures" aria-label="Reconciliation">
            <dt>Cash from tickets</dt>
            <dd>{preview.cashFromTickets}</dd>
            <dt>Cash adjustments</dt>
            <dd>{preview.cashAdjustments}</dd>
            <dt className="tr-total">Expected in the drawer</dt>
            <dd className="tr-total">{preview.expectedCash}</dd>
            <dt>Counted</dt>
            <dd>{reconciliation?.countedCash ?? '—'}</dd>
            <dt className="tr-total">Cash variance</dt>
            <dd className={reconciliation?.needsNote ? 'tr-total tr-variance-over' : 'tr-total'} aria-label="Cash variance">
              {cashVariance}
            </dd>
            <dt>Card, by the tickets</dt>
            <dd>{preview.cardTotalTickets}</dd>
            <dt>Card, by the processor</dt>
            <dd>{preview.cardTotalProcessor}</dd>
            <dt className="tr-total">Card variance</dt>
            <dd className="tr-total" aria-label="Card variance">
              {cardVariance}
            </dd>
          </dl>
        </div>
        <FormGroup
          label={noteRequired ? 'Note (required)' : 'Note'}
          labelFor="close-note"
          helperText={<span id="close-note-help">{noteProblem ?? noteHelp}</span>}
          intent={noteProblem || noteShort ? Intent.DANGER : Intent.NONE}
        >
          <TextArea
            id="close-note"
            fill
            rows={2}
            aria-describedby="close-note-help"
            aria-required={noteRequired || undefined}
            value={note}
            intent={noteProblem || noteShort ? Intent.DANGER : Intent.NONE}
            onChange={(event) => {
              setNote(event.currentTarget.value);
              setNoteProblem(null);
            }}
          />
        </FormGroup>
        {refusal && (
          <Callout intent={Intent.DANGER} role="alert" className="tr-close-refusal">
            {refusal}
          </Callout>
        )}
        <div className="tr-close-day-row">
          <Button
            type="submit"
            intent={Intent.PRIMARY}
            icon={<ConfirmIcon />}
            text="Close the day"
            loading={close.isPending}
            disabled={blockers.length > 0}
            aria-describedby={blockers.length > 0 ? 'close-day-blockers' : undefined}
          />
          {blockers.length > 0 && (
            <ul id="close-day-blockers" className="tr-close-day-blockers">
              {blockers.map((b) => (
                <li key={b}>{b}</li>
              ))}
            </ul>
          )}
        </div>
        <p className="tr-muted tr-small">Once closed, the day’s tickets are locked; corrections go in as adjustments on a later open day.</p>
      </form>
    </section>
  );
}

