import { InputGroup, Intent } from '@blueprintjs/core';
import { type KeyboardEvent, useState } from 'react';
import { hoursProblem, hoursValue } from './hours-figures';

type Props = {
  label: string;
  saved: string | undefined;
  problemId: string;
  problem: string | null;
  onProblem: (problem: string | null) => void;
  onSave: (hours: string) => void;
};

/** One staff-day: typed hours are checked as they are typed and sent when the cell is left or Enter is pressed. */
export function HoursCell({ label, saved, problemId, problem, onProblem, onSave }: Props) {
  // What was typed, over the saved value it was typed over: once the saved value changes, the cell shows it again.
  const [draft, setDraft] = useState<{ text: string; over: string | undefined; sent: boolean } | null>(null);
  const current = draft !== null && draft.over === saved ? draft : null;
  const typed = current?.text ?? null;
  const setTyped = (text: string | null) => setDraft(text === null ? null : { text, over: saved, sent: false });
  const shown = typed ?? saved ?? '';

  const commit = () => {
    if (typed === null || current?.sent) return;
    const refused = hoursProblem(typed);
    onProblem(refused);
    if (refused) return;
    const value = hoursValue(typed);
    if (value === hoursValue(saved ?? '')) setTyped(null);
    else {
      setDraft({ text: typed, over: saved, sent: true });
      onSave(value);
    }
  };

  const keys = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'Enter') commit();
    if (event.key === 'Escape') {
      setTyped(null);
      onProblem(null);
    }
  };

  return (
    <InputGroup
      small
      value={shown}
      inputMode="decimal"
      aria-label={label}
      aria-invalid={problem ? true : undefined}
      aria-describedby={problem ? problemId : undefined}
      intent={problem ? Intent.DANGER : Intent.NONE}
      className="tr-hours-input"
      onValueChange={(value) => {
        setTyped(value);
        onProblem(hoursProblem(value));
      }}
      onBlur={commit}
      onKeyDown={keys}
    />
  );
}
