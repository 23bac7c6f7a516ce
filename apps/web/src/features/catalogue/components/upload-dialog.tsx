import { Button, Callout, Dialog, DialogBody, DialogFooter, FileInput, HTMLTable, Intent, Switch, Tag } from '@blueprintjs/core';
import { DownloadIcon } from '@blueprintjs/icons';
import { useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { ImportResult, ImportRow, SheetKind } from '../api/send-sheet';
import { usePreviewSheet } from '../api/use-preview-sheet';
import { useSaveSheet } from '../api/use-save-sheet';
import { type SheetColumn, sheetRules } from './sheet-columns';

// The API's limits (OpenAPI description of the upload routes): checked here too, to answer before sending.
const MAX_BYTES = 2 * 1024 * 1024;
const ACCEPTED = /\.(csv|xlsx)$/i;

const nouns: Record<SheetKind, { one: string; many: string; title: string }> = {
  products: { one: 'product', many: 'products', title: 'Upload products' },
  services: { one: 'service', many: 'services', title: 'Upload the service menu' },
};

type Props = { kind: SheetKind; isOpen: boolean; columns: SheetColumn[]; template: () => string; onClose: () => void };

export function UploadDialog({ kind, isOpen, columns, template, onClose }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={nouns[kind].title} className="tr-catalogue-upload-dialog">
      {isOpen && <UploadForm kind={kind} columns={columns} template={template} onDone={onClose} />}
    </Dialog>
  );
}

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function UploadForm({ kind, columns, template, onDone }: Omit<Props, 'isOpen' | 'onClose'> & { onDone: () => void }) {
  const noun = nouns[kind];
  const preview = usePreviewSheet(kind);
  const save = useSaveSheet(kind);
  const [file, setFile] = useState<File | null>(null);
  const [fileProblem, setFileProblem] = useState<string | null>(null);
  const [saveProblem, setSaveProblem] = useState<string | null>(null);
  const result = preview.data && !preview.isPending ? preview.data : null;
  const canSave = result !== null && result.invalidRows === 0 && result.creates + result.updates > 0 && !save.isPending;

  const choose = (chosen: File | undefined) => {
    setSaveProblem(null);
    preview.reset();
    setFile(chosen ?? null);
    if (!chosen) return setFileProblem(null);
    if (!ACCEPTED.test(chosen.name)) return setFileProblem('Choose a .csv or .xlsx file.');
    if (chosen.size > MAX_BYTES) return setFileProblem('The file is larger than 2 MB; split it into smaller files.');
    setFileProblem(null);
    preview.mutate(chosen);
  };

  const saveAll = () => {
    if (!file) return;
    setSaveProblem(null);
    save.mutate(file, {
      onSuccess: (saved) => {
        void showToast({
          intent: Intent.SUCCESS,
          message: `Saved from ${file.name}: ${count(saved.creates, `${noun.one} added`, `${noun.many} added`)}, ${saved.updates} updated, ${saved.unchanged} unchanged.`,
        });
        onDone();
      },
      onError: (error) => {
        // The catalogue changed since the preview: say so in the server's words and check the file again.
        setSaveProblem(errorMessage(error));
        preview.mutate(file);
      },
    });
  };

  const download = () => {
    const url = URL.createObjectURL(new Blob([template()], { type: 'text/csv;charset=utf-8' }));
    const link = document.createElement('a');
    link.href = url;
    link.download = `tressury-${kind}.csv`;
    link.click();
    URL.revokeObjectURL(url);
  };

  return (
    <>
      <DialogBody className="tr-catalogue-upload-body">
        <div className="tr-catalogue-upload-pick">
          <FileInput
            text={file?.name ?? 'Choose a .csv or .xlsx file…'}
            buttonText="Browse"
            hasSelection={file !== null}
            inputProps={{ accept: '.csv,.xlsx', 'aria-label': `Spreadsheet of ${noun.many}` }}
            onInputChange={(event) => choose(event.currentTarget.files?.[0])}
            className="tr-catalogue-file"
          />
          <Button icon={<DownloadIcon />} variant="minimal" text="Download the current list as a template (.csv)" onClick={download} />
        </div>
        {fileProblem && (
          <Callout intent={Intent.DANGER} role="alert" className="tr-catalogue-upload-callout">
            {fileProblem}
          </Callout>
        )}
        {preview.isError && (
          <Callout intent={Intent.DANGER} role="alert" className="tr-catalogue-upload-callout" title="The file could not be checked">
            {errorMessage(preview.error)}
          </Callout>
        )}
        {saveProblem && (
          <Callout intent={Intent.DANGER} role="alert" className="tr-catalogue-upload-callout" title="Nothing was saved">
            {saveProblem}
          </Callout>
        )}
        {preview.isPending && <p className="tr-muted">Checking {file?.name}…</p>}
        {result ? <PreviewTable result={result} noun={noun} /> : !preview.isPending && <ColumnGuide kind={kind} columns={columns} />}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={save.isPending} />
            <Button intent={Intent.PRIMARY} text="Save all" disabled={!canSave} loading={save.isPending} onClick={saveAll} />
          </>
        }
      >
        {result && (
          <span className="tr-muted">
            {result.invalidRows > 0
              ? 'Fix the marked cells in your file and choose it again; nothing is saved until every row is good.'
              : result.creates + result.updates === 0
                ? 'Every row matches what is already saved: nothing to do.'
                : 'All rows are good. Saving writes every row at once.'}
          </span>
        )}
      </DialogFooter>
    </>
  );
}

function ColumnGuide({ kind, columns }: { kind: SheetKind; columns: SheetColumn[] }) {
  return (
    <section aria-label="Columns the file needs">
      <p>
        Row 1 holds the column headings below (any case; a space may stand for an underscore), one {nouns[kind].one} per row after it. You see every row checked
        before anything is saved.
      </p>
      <HTMLTable compact className="tr-table tr-catalogue-columns" aria-label="Columns">
        <thead>
          <tr>
            <th scope="col">Heading</th>
            <th scope="col">Needed</th>
            <th scope="col">What goes in it</th>
          </tr>
        </thead>
        <tbody>
          {columns.map((column) => (
            <tr key={column.heading}>
              <td>
                <code>{column.heading}</code>
              </td>
              <td>{column.required ? 'Required' : <span className="tr-muted">Optional</span>}</td>
              <td>{column.note}</td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
      <ul className="tr-catalogue-rules">
        {sheetRules[kind].map((rule) => (
          <li key={rule}>{rule}</li>
        ))}
        <li>A .csv (UTF-8) or .xlsx file of at most 2 MB and 2,000 rows. Formulas are not worked out: type values.</li>
      </ul>
    </section>
  );
}

const actionTags: Record<ImportRow['action'], { label: string; intent: Intent }> = {
  create: { label: 'Adds', intent: Intent.PRIMARY },
  update: { label: 'Updates', intent: Intent.SUCCESS },
  unchanged: { label: 'No change', intent: Intent.NONE },
};

function PreviewTable({ result, noun }: { result: ImportResult; noun: { one: string; many: string } }) {
  const [onlyBad, setOnlyBad] = useState(false);
  const headings = [...new Set(result.rows.flatMap((row) => Object.keys(row.values)))];
  const rows = onlyBad ? result.rows.filter((row) => row.errors.length > 0) : result.rows;
  return (
    <section aria-label="Preview">
      <div className="tr-catalogue-upload-summary" aria-live="polite">
        <strong>{count(result.rows.length, 'row', 'rows')} checked:</strong>
        <Tag minimal intent={Intent.PRIMARY}>
          {result.creates} to add
        </Tag>
        <Tag minimal intent={Intent.SUCCESS}>
          {result.updates} to update
        </Tag>
        <Tag minimal>{result.unchanged} unchanged</Tag>
        <Tag minimal={result.invalidRows === 0} intent={result.invalidRows > 0 ? Intent.DANGER : Intent.NONE}>
          {count(result.invalidRows, 'row', 'rows')} with errors
        </Tag>
        {result.invalidRows > 0 && (
          <Switch className="tr-catalogue-only-bad" label="Only rows with errors" checked={onlyBad} onChange={(event) => setOnlyBad(event.currentTarget.checked)} />
        )}
      </div>
      <div className="tr-table-frame tr-catalogue-preview-frame">
        <HTMLTable compact className="tr-table tr-catalogue-preview" aria-label={`Preview of the ${noun.many}`}>
          <thead>
            <tr>
              <th scope="col" className="tr-figure">
                Row
              </th>
              <th scope="col">Result</th>
              {headings.map((heading) => (
                <th key={heading} scope="col">
                  {heading}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => {
              const bad = row.errors.length > 0;
              const elsewhere = row.errors.filter((e) => !headings.includes(e.field));
              return (
                <tr key={row.row} className={bad ? 'tr-catalogue-row-bad' : undefined}>
                  <th scope="row" className="tr-figure">
                    {row.row}
                  </th>
                  <td className="tr-nowrap">
                    {bad ? (
                      <Tag intent={Intent.DANGER}>{count(row.errors.length, 'error', 'errors')}</Tag>
                    ) : (
                      <Tag minimal intent={actionTags[row.action].intent}>
                        {actionTags[row.action].label}
                      </Tag>
                    )}
                    {elsewhere.map((e) => (
                      <div key={e.field + e.message} className="tr-catalogue-cell-problem">
                        {e.field}: {e.message}
                      </div>
                    ))}
                  </td>
                  {headings.map((heading) => {
                    const problems = row.errors.filter((e) => e.field === heading);
                    const value = row.values[heading] ?? '';
                    return (
                      <td key={heading} className={problems.length > 0 ? 'tr-catalogue-cell-bad' : undefined} aria-invalid={problems.length > 0 || undefined}>
                        {value === '' ? <span className="tr-muted">empty</span> : value}
                        {problems.map((p) => (
                          <div key={p.message} className="tr-catalogue-cell-problem">
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
