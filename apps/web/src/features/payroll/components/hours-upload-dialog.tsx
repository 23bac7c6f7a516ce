import { Button, Callout, Dialog, DialogBody, DialogFooter, FileInput, HTMLTable, Intent, Switch, Tag } from '@blueprintjs/core';
import { DownloadIcon } from '@blueprintjs/icons';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { TimesheetImport } from '../api/timesheet-queries';
import { useImportTimesheet } from '../api/use-import-timesheet';

// The API's limits for a timesheet upload (its OpenAPI description); checked here too, to answer before sending.
const MAX_BYTES = 2 * 1024 * 1024;
const ACCEPTED = /\.(csv|xlsx)$/i;
const COLUMNS = ['staff_id', 'branch_id', 'date', 'hours'] as const;

type Props = {
  isOpen: boolean;
  periodId: string;
  period: string;
  /** Names for the ids a file holds, so the preview reads as people and places. */
  names: Map<string, string>;
  template: () => string;
  templateName: string;
  onClose: () => void;
};

export function HoursUploadDialog({ isOpen, onClose, ...rest }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={`Upload hours for ${rest.period}`} className="tr-hours-upload-dialog">
      {isOpen && <UploadForm {...rest} onDone={onClose} />}
    </Dialog>
  );
}

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function UploadForm({ periodId, names, template, templateName, onDone }: Omit<Props, 'isOpen' | 'onClose' | 'period'> & { onDone: () => void }) {
  const preview = useImportTimesheet(periodId);
  const save = useImportTimesheet(periodId);
  const [file, setFile] = useState<File | null>(null);
  const [fileProblem, setFileProblem] = useState<string | null>(null);
  const [saveProblem, setSaveProblem] = useState<string | null>(null);
  const result = preview.data && !preview.isPending ? preview.data : null;
  const clean = result !== null && result.invalidRows === 0 && result.rows.length > 0;

  const choose = (chosen: File | undefined) => {
    setSaveProblem(null);
    preview.reset();
    setFile(chosen ?? null);
    if (!chosen) return setFileProblem(null);
    if (!ACCEPTED.test(chosen.name)) return setFileProblem('Choose a .csv or .xlsx file.');
    if (chosen.size > MAX_BYTES) return setFileProblem('The file is larger than 2 MB; split it into smaller files.');
    setFileProblem(null);
    preview.mutate({ file: chosen, commit: false });
  };

  const saveAll = () => {
    if (!file) return;
    setSaveProblem(null);
    save.mutate(
      { file, commit: true },
      {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Saved ${count(saved.validRows, 'day of hours', 'days of hours')} from ${file.name}.` });
          onDone();
        },
        onError: (error) => {
          // Something changed since the preview (a period approved, a person moved): say so and check again.
          setSaveProblem(errorMessage(error));
          preview.mutate({ file, commit: false });
        },
      },
    );
  };

  const download = () => {
    const url = URL.createObjectURL(new Blob([template()], { type: 'text/csv;charset=utf-8' }));
    const link = document.createElement('a');
    link.href = url;
    link.download = templateName;
    link.click();
    URL.revokeObjectURL(url);
  };

  return (
    <>
      <DialogBody className="tr-hours-upload-body">
        <div className="tr-hours-upload-pick">
          <FileInput
            text={file?.name ?? 'Choose a .csv or .xlsx file…'}
            buttonText="Browse"
            hasSelection={file !== null}
            inputProps={{ accept: '.csv,.xlsx', 'aria-label': 'Timesheet file' }}
            onInputChange={(event) => choose(event.currentTarget.files?.[0])}
          />
          <Button icon={<DownloadIcon />} variant="minimal" text="Download this branch’s hours as a template (.csv)" onClick={download} />
        </div>
        {fileProblem && (
          <Callout intent={Intent.DANGER} role="alert">
            {fileProblem}
          </Callout>
        )}
        {preview.isError && (
          <Callout intent={Intent.DANGER} role="alert" title="The file could not be checked">
            {errorMessage(preview.error)}
          </Callout>
        )}
        {saveProblem && (
          <Callout intent={Intent.DANGER} role="alert" title="Nothing was saved">
            {saveProblem}
          </Callout>
        )}
        {preview.isPending && <p className="tr-muted">Checking {file?.name}…</p>}
        {result ? <PreviewTable result={result} names={names} /> : !preview.isPending && <ColumnGuide />}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={save.isPending} />
            {clean && <Button intent={Intent.PRIMARY} text={`Save all ${count(result.rows.length, 'row', 'rows')}`} loading={save.isPending} onClick={saveAll} />}
          </>
        }
      >
        {result && (
          <span className="tr-muted">
            {result.invalidRows > 0
              ? 'Fix the marked cells in your file and choose it again: nothing is saved until every row is good.'
              : result.rows.length === 0
                ? 'The file has no rows of hours.'
                : 'Every row is good. Saving writes all of them at once.'}
          </span>
        )}
      </DialogFooter>
    </>
  );
}

function ColumnGuide() {
  return (
    <section aria-label="Columns the file needs">
      <p>Row 1 holds the column headings, then one row per staff member and day. Every row is checked and shown before anything is saved.</p>
      <ul className="tr-hours-upload-rules">
        <li>
          <code>staff_id</code> — the staff member’s id, as in the template (required).
        </li>
        <li>
          <code>date</code> — the work day, written YYYY-MM-DD, inside this pay period (required).
        </li>
        <li>
          <code>hours</code> — from 0 to 24, at most 3 decimals; 0 clears the day (required).
        </li>
        <li>
          <code>branch_id</code> — where the hours were worked (optional: the staff member’s home branch).
        </li>
        <li>Other columns, such as the template’s staff_name, are left as they are. A .csv (UTF-8) or .xlsx file of at most 2 MB.</li>
      </ul>
    </section>
  );
}

function PreviewTable({ result, names }: { result: TimesheetImport; names: Map<string, string> }) {
  const [onlyBad, setOnlyBad] = useState(false);
  const rows = onlyBad ? result.rows.filter((row) => row.errors.length > 0) : result.rows;
  return (
    <section aria-label="Preview">
      <div className="tr-hours-upload-summary" aria-live="polite">
        <strong>{count(result.rows.length, 'row', 'rows')} checked:</strong>
        <Tag minimal intent={Intent.SUCCESS}>
          {result.validRows} good
        </Tag>
        <Tag minimal={result.invalidRows === 0} intent={result.invalidRows > 0 ? Intent.DANGER : Intent.NONE}>
          {count(result.invalidRows, 'row', 'rows')} with errors
        </Tag>
        {result.invalidRows > 0 && <Switch label="Only rows with errors" checked={onlyBad} onChange={(event) => setOnlyBad(event.currentTarget.checked)} />}
      </div>
      <div className="tr-table-frame tr-hours-upload-preview">
        <HTMLTable compact className="tr-table" aria-label="Preview of the hours">
          <thead>
            <tr>
              <th scope="col" className="tr-figure">
                Row
              </th>
              <th scope="col">Result</th>
              {COLUMNS.map((column) => (
                <th key={column} scope="col" className={column === 'hours' ? 'tr-figure' : undefined}>
                  {column}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => {
              const bad = row.errors.length > 0;
              return (
                <tr key={row.row} className={bad ? 'tr-hours-row-bad' : undefined}>
                  <th scope="row" className="tr-figure">
                    {row.row}
                  </th>
                  <td className="tr-nowrap">{bad ? <Tag intent={Intent.DANGER}>{count(row.errors.length, 'error', 'errors')}</Tag> : <Tag minimal>Good</Tag>}</td>
                  {COLUMNS.map((column) => {
                    const problems = row.errors.filter((e) => e.field === column);
                    const value = row.values[column] ?? '';
                    const name = column === 'staff_id' || column === 'branch_id' ? names.get(value) : undefined;
                    return (
                      <td
                        key={column}
                        className={[problems.length > 0 && 'tr-hours-cell-bad', column === 'hours' && 'tr-figure'].filter(Boolean).join(' ') || undefined}
                        aria-invalid={problems.length > 0 || undefined}
                      >
                        {value === '' ? <span className="tr-muted">empty</span> : (name ?? value)}
                        {problems.map((p) => (
                          <div key={p.message} className="tr-hours-cell-problem">
                            {p.message}
                          </div>
                        ))}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </HTMLTable>
      </div>
    </section>
  );
}
