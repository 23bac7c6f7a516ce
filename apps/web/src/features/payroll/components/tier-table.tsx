import { Button, HTMLTable, InputGroup, Intent } from '@blueprintjs/core';
import { PlusIcon, TrashIcon } from '@blueprintjs/icons';
import { useEffect, useRef } from 'react';
import { moneyText, type Problems, type TierRow, tierRow } from './plan-terms-values';

type Props = {
  rows: TierRow[];
  onChange: (rows: TierRow[]) => void;
  /** By field path: `tiers[1].from`, `tiers[1].rate`, or `tiers` for the list as a whole. */
  problems: Problems;
  readOnly: boolean;
};

export const MAX_TIERS = 20;
export const tierFieldId = (index: number, part: 'from' | 'rate') => `plan-tier-${index}-${part}`;

/**
 * The tiers as a small table: the first starts at zero, each later one from the revenue typed. Adding a tier
 * moves the cursor into it; removing one moves it to the tier above.
 */
export function TierTable({ rows, onChange, problems, readOnly }: Props) {
  const frameRef = useRef<HTMLDivElement>(null);
  const focusNext = useRef<string | null>(null);

  useEffect(() => {
    if (!focusNext.current) return;
    frameRef.current?.querySelector<HTMLElement>(`#${focusNext.current}`)?.focus();
    focusNext.current = null;
  });

  const change = (key: string, changes: Partial<TierRow>) => onChange(rows.map((row) => (row.key === key ? { ...row, ...changes } : row)));
  const add = () => {
    focusNext.current = tierFieldId(rows.length, 'from');
    onChange([...rows, tierRow()]);
  };
  const remove = (index: number) => {
    focusNext.current = index - 1 === 0 ? tierFieldId(0, 'rate') : tierFieldId(index - 1, 'from');
    onChange(rows.filter((_, i) => i !== index));
  };

  return (
    <div className="tr-tier-editor" ref={frameRef}>
      <HTMLTable compact className="tr-table tr-tier-table" aria-label="Commission tiers">
        <thead>
          <tr>
            <th scope="col">Tier</th>
            <th scope="col" className="tr-figure">
              From period revenue
            </th>
            <th scope="col" className="tr-figure">
              Rate
            </th>
            {!readOnly && (
              <th scope="col">
                <span className="tr-visually-hidden">Remove</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => {
            const fromProblem = problems[`tiers[${i}].from`];
            const rateProblem = problems[`tiers[${i}].rate`];
            const helpId = `plan-tier-${i}-help`;
            const rowProblem = [fromProblem, rateProblem].filter(Boolean).join(' ');
            return (
              <tr key={row.key} className={rowProblem ? 'tr-tier-row-problem' : undefined}>
                <th scope="row" className="tr-nowrap">
                  {i + 1}
                </th>
                <td className="tr-figure">
                  {i === 0 ? (
                    <span title="The first tier starts at zero">0.00</span>
                  ) : readOnly ? (
                    moneyText(row.from)
                  ) : (
                    <InputGroup
                      id={tierFieldId(i, 'from')}
                      aria-label={`Tier ${i + 1} from period revenue`}
                      aria-invalid={fromProblem ? true : undefined}
                      aria-describedby={rowProblem ? helpId : undefined}
                      intent={fromProblem ? Intent.DANGER : Intent.NONE}
                      inputMode="decimal"
                      className="tr-tier-input"
                      value={row.from}
                      onValueChange={(value) => change(row.key, { from: value })}
                    />
                  )}
                  {rowProblem && (
                    <div id={helpId} className="tr-tier-problem">
                      {rowProblem}
                    </div>
                  )}
                </td>
                <td className="tr-figure">
                  {readOnly ? (
                    `${row.ratePercent}\u00a0%`
                  ) : (
                    <InputGroup
                      id={tierFieldId(i, 'rate')}
                      aria-label={`Tier ${i + 1} rate %`}
                      aria-invalid={rateProblem ? true : undefined}
                      aria-describedby={rowProblem ? helpId : undefined}
                      intent={rateProblem ? Intent.DANGER : Intent.NONE}
                      inputMode="decimal"
                      className="tr-tier-input tr-tier-rate"
                      rightElement={<span className="tr-tier-unit">%</span>}
                      value={row.ratePercent}
                      onValueChange={(value) => change(row.key, { ratePercent: value })}
                    />
                  )}
                </td>
                {!readOnly && (
                  <td className="tr-row-actions">
                    {i > 0 && (
                      <Button variant="minimal" size="small" icon={<TrashIcon />} aria-label={`Remove tier ${i + 1}`} onClick={() => remove(i)} />
                    )}
                  </td>
                )}
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
      {problems.tiers && (
        <p className="tr-tier-problem" role="alert">
          {problems.tiers}
        </p>
      )}
      {!readOnly && (
        <Button
          className="tr-tier-add"
          variant="minimal"
          icon={<PlusIcon />}
          text={rows.length >= MAX_TIERS ? `At most ${MAX_TIERS} tiers` : 'Add tier'}
          disabled={rows.length >= MAX_TIERS}
          onClick={add}
        />
      )}
    </div>
  );
}
