import { HTMLTable, Intent } from '@blueprintjs/core';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { useSetHours } from '../api/use-set-hours';
import { HoursCell } from './hours-cell';
import type { GridRow } from './hours-figures';
import { sumHours } from './review-figures';
import { dayText } from './run-dates';

type Props = { periodId: string; branchId: string; rows: GridRow[]; days: string[]; today: string; editable: boolean };

const short = new Intl.DateTimeFormat(undefined, { timeZone: 'UTC', weekday: 'short' });
const dayOfMonth = (date: string) => String(Number(date.slice(8, 10)));
const weekday = (date: string) => short.format(new Date(`${date}T12:00:00Z`));

type Problem = { key: string; text: string };

/** Staff down, days across: the hours each worked at this branch, typed in place by those who may. */
export function HoursGrid({ periodId, branchId, rows, days, today, editable }: Props) {
  const setHours = useSetHours(periodId);
  const [problems, setProblems] = useState<Record<string, Problem>>({});
  const [status, setStatus] = useState<{ intent: Intent; text: string } | null>(null);

  const problemId = (key: string) => `hours-problem-${key.replaceAll(':', '-')}`;
  const note = (key: string, where: string, text: string | null) =>
    setProblems((current) => {
      const next = { ...current };
      if (text) next[key] = { key, text: `${where}: ${text}` };
      else delete next[key];
      return next;
    });

  const save = (row: GridRow, date: string, hours: string) => {
    const key = `${row.staffId}:${date}`;
    const where = `${row.staffName}, ${dayText(date)}`;
    setHours.mutate(
      { staffId: row.staffId, branchId, date, hours },
      {
        onSuccess: () => setStatus({ intent: Intent.SUCCESS, text: `Saved ${where}: ${hours === '0' ? 'no hours' : `${hours} h`}.` }),
        onError: (error) => note(key, where, errorMessage(error)),
      },
    );
  };

  const listed = Object.values(problems);
  return (
    <div className="tr-hours">
      <div className="tr-table-frame">
        <HTMLTable compact bordered className="tr-table tr-hours-table" aria-label="Hours by staff member and day">
          <thead>
            <tr>
              <th scope="col" className="tr-hours-name">
                Staff member
              </th>
              {days.map((date) => (
                <th key={date} scope="col" className="tr-figure tr-hours-day" title={dayText(date)}>
                  <span className="tr-hours-weekday">{weekday(date)}</span> {dayOfMonth(date)}
                </th>
              ))}
              <th scope="col" className="tr-figure">
                Total
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.staffId}>
                <th scope="row" className="tr-row-head tr-hours-name">
                  {row.staffName}
                </th>
                {days.map((date) => {
                  const key = `${row.staffId}:${date}`;
                  const saved = row.hours.get(date);
                  return (
                    <td key={date} className="tr-figure tr-hours-cell">
                      {editable && date <= today ? (
                        <HoursCell
                          label={`${row.staffName}, ${dayText(date)}: hours`}
                          saved={saved}
                          problemId={problemId(key)}
                          problem={problems[key]?.text ?? null}
                          onProblem={(text) => note(key, `${row.staffName}, ${dayText(date)}`, text)}
                          onSave={(hours) => save(row, date, hours)}
                        />
                      ) : (
                        <span aria-label={`${row.staffName}, ${dayText(date)}: ${saved ?? 'no'} hours`}>{saved ?? <span className="tr-muted">·</span>}</span>
                      )}
                    </td>
                  );
                })}
                <td className="tr-figure tr-hours-total">{sumHours([...row.hours.values()])}</td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <th scope="row" className="tr-hours-name">
                Total
              </th>
              {days.map((date) => (
                <td key={date} className="tr-figure">
                  {sumHours(rows.map((row) => row.hours.get(date) ?? '0'))}
                </td>
              ))}
              <td className="tr-figure tr-hours-total">{sumHours(rows.flatMap((row) => [...row.hours.values()]))}</td>
            </tr>
          </tfoot>
        </HTMLTable>
      </div>
      {listed.length > 0 && (
        <ul className="tr-hours-problems" role="alert">
          {listed.map((problem) => (
            <li key={problem.key} id={problemId(problem.key)}>
              {problem.text}
            </li>
          ))}
        </ul>
      )}
      <p className="tr-muted tr-hours-status" aria-live="polite">
        {status?.text ?? (editable ? 'Type hours into a day and press Enter or move on to save it; Escape puts back what was saved. An empty day has no hours.' : '')}
      </p>
    </div>
  );
}
