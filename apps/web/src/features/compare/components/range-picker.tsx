import { Button, ButtonGroup, FormGroup, InputGroup, Intent } from '@blueprintjs/core';
import { useState } from 'react';
import { isBusinessDate } from '../../../lib/business-date';
import { type CompareRange, MAX_RANGE_DAYS, MAX_REBOOKING_DAYS } from './compare-range';
import { daysIn, type PayCalendar, presetLabels, presetMatching, presetRange, rangePresets } from './date-ranges';

type Props = {
  range: CompareRange;
  /** The business date today in the branch's time zone; presets count from it. */
  today: string;
  /** The pay calendar; null when no pay schedule is set, undefined while it loads. */
  calendar: PayCalendar | null | undefined;
  onChange: (range: CompareRange) => void;
  /** Whether to offer the rebooking window (only the comparison has a rebooking figure). */
  withRebooking?: boolean;
};

/** Presets for the usual questions, and exact dates for any other; every change goes to the address. */
export function RangePicker({ range, today, calendar, onChange, withRebooking = false }: Props) {
  const chosen = presetMatching(range, today, calendar ?? null);
  return (
    <div className="tr-range-picker" role="group" aria-label="Dates to compare">
      <ButtonGroup className="tr-range-presets" aria-label="Preset ranges">
        {rangePresets.map((preset) => {
          const dates = presetRange(preset, today, calendar ?? null);
          return (
            <Button
              key={preset}
              text={presetLabels[preset]}
              active={chosen === preset}
              aria-pressed={chosen === preset}
              intent={chosen === preset ? Intent.PRIMARY : Intent.NONE}
              disabled={dates === null}
              onClick={() => dates && onChange({ ...range, ...dates })}
            />
          );
        })}
      </ButtonGroup>
      {calendar === null && <span className="tr-muted tr-range-hint">Last pay period: no pay schedule is set yet.</span>}
      {/* Keyed by the range so the fields show a preset's dates as soon as it is chosen. */}
      <ExactDates key={`${range.from}/${range.to}/${range.rebookingDays}`} range={range} today={today} onChange={onChange} withRebooking={withRebooking} />
    </div>
  );
}

function ExactDates({ range, today, onChange, withRebooking }: Omit<Props, 'calendar'>) {
  const [from, setFrom] = useState(range.from);
  const [to, setTo] = useState(range.to);
  const [rebooking, setRebooking] = useState(String(range.rebookingDays));

  const ordered = isBusinessDate(from) && isBusinessDate(to) && from <= to;
  const datesOk = ordered && daysIn({ from, to }) <= MAX_RANGE_DAYS;
  const rebookingOk = /^\d{1,3}$/.test(rebooking) && Number(rebooking) >= 1 && Number(rebooking) <= MAX_REBOOKING_DAYS;
  const changed = from !== range.from || to !== range.to || rebooking !== String(range.rebookingDays);

  const apply = () => {
    if (datesOk && rebookingOk && changed) onChange({ from, to, rebookingDays: Number(rebooking) });
  };

  return (
    <form
      className="tr-range-exact"
      onSubmit={(event) => {
        event.preventDefault();
        apply();
      }}
    >
      <FormGroup label="From" labelFor="compare-from" inline className="tr-range-field">
        <InputGroup id="compare-from" type="date" className="tr-date-input" value={from} max={today} intent={datesOk ? Intent.NONE : Intent.DANGER} onValueChange={setFrom} />
      </FormGroup>
      <FormGroup label="To" labelFor="compare-to" inline className="tr-range-field">
        <InputGroup id="compare-to" type="date" className="tr-date-input" value={to} max={today} intent={datesOk ? Intent.NONE : Intent.DANGER} onValueChange={setTo} />
      </FormGroup>
      {withRebooking && (
        <FormGroup label="Rebooked within (days)" labelFor="compare-rebooking" inline className="tr-range-field">
          <InputGroup
            id="compare-rebooking"
            className="tr-rebooking-input"
            inputMode="numeric"
            value={rebooking}
            intent={rebookingOk ? Intent.NONE : Intent.DANGER}
            onValueChange={setRebooking}
          />
        </FormGroup>
      )}
      <Button type="submit" text="Show" disabled={!changed || !datesOk || !rebookingOk} />
      {!datesOk && (
        <p className="tr-range-problem" role="alert">
          {ordered ? `Compare at most ${MAX_RANGE_DAYS} days at a time.` : 'Choose a first day on or before the last day.'}
        </p>
      )}
      {datesOk && !rebookingOk && (
        <p className="tr-range-problem" role="alert">
          The rebooking window is a whole number of days from 1 to {MAX_REBOOKING_DAYS}.
        </p>
      )}
    </form>
  );
}
