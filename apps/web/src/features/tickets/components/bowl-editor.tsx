import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, TextArea } from '@blueprintjs/core';
import { PlusIcon, TrashIcon } from '@blueprintjs/icons';
import { type FormEvent, useMemo, useState } from 'react';
import { showToast } from '../../../lib/toaster';
import type { Product, StaffMember } from '../api/picker-queries';
import type { ServiceLine } from '../api/ticket-queries';
import { type NewBowl, useRecordBowl } from '../api/use-record-bowl';
import { bowlProductKinds, type ComponentRow, isBowlProduct, liveBowl, type MassUnit } from './bowl-figures';
import { fieldProblems, leftoverProblem, type Problems } from './field-problems';
import { plainFigure, ratioText } from './figures';
import { SafetyCautions } from '../../../components/safety-cautions';
import { StaffSelect } from './staff-select';

const kindHeadings: Record<(typeof bowlProductKinds)[number], string> = {
  permanent: 'Permanent colour',
  demi_permanent: 'Demi-permanent colour',
  lightener: 'Lightener',
  developer: 'Developer',
  treatment: 'Treatment',
};

type Props = {
  isOpen: boolean;
  ticketId: string;
  line: ServiceLine;
  products: Product[];
  staff: StaffMember[];
  /** A sentence on this client's patch test, shown in the safety panel. */
  patchTestNote?: string;
  onClose: () => void;
};

export function BowlEditor({ isOpen, line, onClose, ...rest }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={`Bowl for ${line.serviceName} · ${line.staffName}`} className="tr-bowl-dialog">
      {isOpen && <BowlForm line={line} onDone={onClose} {...rest} />}
    </Dialog>
  );
}

let rowCount = 0;
const blankRow = (unit: MassUnit = 'g'): ComponentRow => ({ key: `row-${++rowCount}`, productId: '', amount: '', unit });

function BowlForm({ ticketId, line, products, staff, patchTestNote, onDone }: Omit<Props, 'isOpen' | 'onClose'> & { onDone: () => void }) {
  const record = useRecordBowl(ticketId);
  // A colour or lightener and its developer are the usual start.
  const [rows, setRows] = useState<ComponentRow[]>(() => [blankRow(), blankRow()]);
  const [mixedBy, setMixedBy] = useState(line.staffId);
  const [leftover, setLeftover] = useState('');
  const [minutes, setMinutes] = useState('');
  const [note, setNote] = useState('');
  const [problems, setProblems] = useState<Problems>({});
  const [refusal, setRefusal] = useState<string | null>(null);

  const bowlProducts = useMemo(() => products.filter(isBowlProduct), [products]);
  const byId = useMemo(() => new Map(bowlProducts.map((p) => [p.id, p])), [bowlProducts]);
  const live = liveBowl(rows, byId, leftover);
  const figures = live.figures;

  const change = (key: string, changes: Partial<ComponentRow>) => {
    setRows((current) => current.map((row) => (row.key === key ? { ...row, ...changes } : row)));
    setProblems({});
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const filled = rows.filter((row) => row.productId !== '' || row.amount.trim() !== '');
    const local: Problems = {};
    filled.forEach((row) => {
      const index = rows.indexOf(row);
      if (!row.productId) local[`row-${index}-product`] = 'Choose the product.';
      if (row.amount.trim() === '') local[`row-${index}-amount`] = 'Give the amount weighed.';
    });
    if (filled.length === 0) local.components = 'Add at least one product with its amount.';
    if (Object.keys(local).length > 0 || live.rows.some((r) => r.problem) || live.leftoverProblem) {
      setProblems(local);
      return;
    }
    const body: NewBowl = {
      serviceLineId: line.id,
      mixedByStaffId: mixedBy || undefined,
      components: filled.map((row) => ({ productId: row.productId, amount: row.amount.trim(), unit: row.unit })),
      leftoverGrams: leftover.trim() || undefined,
      processingMinutes: minutes.trim() === '' ? undefined : Number(minutes),
      note: note.trim() || undefined,
    };
    // The server names a component by its place among those sent; map that back to the row on screen.
    const rowIndexOf = filled.map((row) => rows.indexOf(row));
    record.mutate(body, {
      onSuccess: () => {
        void showToast({ intent: Intent.SUCCESS, message: `Bowl recorded on ${line.serviceName}.` });
        onDone();
      },
      onError: (error) => {
        const found = fieldProblems(error);
        const mapped: Problems = {};
        for (const [field, message] of Object.entries(found)) {
          const component = /^components\[(\d+)\]\.(productId|amount|unit)$/.exec(field);
          if (component) mapped[`row-${rowIndexOf[Number(component[1])]}-${component[2] === 'productId' ? 'product' : 'amount'}`] = message;
          else mapped[field] = message;
        }
        setProblems(mapped);
        setRefusal(leftoverProblem(error, ['components', 'leftoverGrams', 'processingMinutes', 'note', 'mixedByStaffId']));
      },
    });
  };

  const rowProblem = (index: number) => problems[`row-${index}-product`] ?? problems[`row-${index}-amount`] ?? live.rows[index]?.problem ?? null;

  return (
    <form onSubmit={submit} noValidate>
      <DialogBody className="tr-bowl-body">
        <div className="tr-bowl-form">
          <table className="tr-bowl-rows" aria-label="What went in the bowl">
            <thead>
              <tr>
                <th scope="col">Product</th>
                <th scope="col" className="tr-figure">
                  Amount
                </th>
                <th scope="col">Unit</th>
                <th scope="col" className="tr-figure">
                  Grams
                </th>
                <th scope="col">
                  <span className="tr-visually-hidden">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((row, index) => {
                const problem = rowProblem(index);
                const place = index + 1;
                return (
                  <tr key={row.key} className={problem ? 'tr-row-invalid' : undefined}>
                    <td>
                      <HTMLSelect
                        fill
                        aria-label={`Product ${place}`}
                        value={row.productId}
                        autoFocus={index === 0}
                        aria-invalid={problems[`row-${index}-product`] ? true : undefined}
                        onChange={(event) => change(row.key, { productId: event.currentTarget.value })}
                      >
                        <option value="">Choose a product</option>
                        {bowlProductKinds.map((kind) => (
                          <optgroup key={kind} label={kindHeadings[kind]}>
                            {bowlProducts
                              .filter((p) => p.kind === kind)
                              .map((p) => (
                                <option key={p.id} value={p.id}>
                                  {p.name}
                                </option>
                              ))}
                          </optgroup>
                        ))}
                      </HTMLSelect>
                    </td>
                    <td className="tr-bowl-amount">
                      <InputGroup
                        aria-label={`Amount ${place}`}
                        inputMode="decimal"
                        value={row.amount}
                        intent={problems[`row-${index}-amount`] || live.rows[index]?.problem ? Intent.DANGER : Intent.NONE}
                        aria-invalid={problems[`row-${index}-amount`] || live.rows[index]?.problem ? true : undefined}
                        onValueChange={(amount) => change(row.key, { amount })}
                      />
                    </td>
                    <td>
                      <HTMLSelect aria-label={`Unit ${place}`} value={row.unit} onChange={(event) => change(row.key, { unit: event.currentTarget.value as MassUnit })}>
                        <option value="g">g</option>
                        <option value="oz">oz</option>
                      </HTMLSelect>
                    </td>
                    <td className="tr-figure tr-muted" aria-label={`Grams ${place}`}>
                      {live.rows[index]?.grams ? `${live.rows[index]?.grams} g` : ''}
                    </td>
                    <td>
                      <Button
                        variant="minimal"
                        icon={<TrashIcon />}
                        aria-label={`Remove line ${place}`}
                        disabled={rows.length === 1}
                        onClick={() => setRows((current) => current.filter((r) => r.key !== row.key))}
                      />
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          {rows.map((_, index) => rowProblem(index)).some(Boolean) && (
            <ul className="tr-field-problems" aria-live="polite">
              {rows.map((_, index) => {
                const problem = rowProblem(index);
                return problem ? <li key={index}>{`Product ${index + 1}: ${problem}`}</li> : null;
              })}
            </ul>
          )}
          {problems.components && <p className="tr-field-problem">{problems.components}</p>}
          <Button variant="minimal" icon={<PlusIcon />} text="Add a product" onClick={() => setRows((current) => [...current, blankRow()])} />

          <div className="tr-bowl-extras">
            <FormGroup label="Mixed by" labelFor="bowl-mixed-by" helperText={problems.mixedByStaffId} intent={problems.mixedByStaffId ? Intent.DANGER : Intent.NONE}>
              <StaffSelect id="bowl-mixed-by" staff={staff} value={mixedBy} onChange={setMixedBy} emptyLabel={`${line.staffName} (the stylist)`} />
            </FormGroup>
            <FormGroup
              label="Leftover (g)"
              labelFor="bowl-leftover"
              helperText={problems.leftoverGrams ?? live.leftoverProblem ?? 'Weighed back after the service.'}
              intent={problems.leftoverGrams || live.leftoverProblem ? Intent.DANGER : Intent.NONE}
            >
              <InputGroup id="bowl-leftover" className="tr-figure-input" inputMode="decimal" value={leftover} onValueChange={setLeftover} intent={live.leftoverProblem ? Intent.DANGER : Intent.NONE} />
            </FormGroup>
            <FormGroup
              label="Processing (min)"
              labelFor="bowl-minutes"
              helperText={problems.processingMinutes}
              intent={problems.processingMinutes ? Intent.DANGER : Intent.NONE}
            >
              <InputGroup id="bowl-minutes" className="tr-figure-input" inputMode="numeric" value={minutes} onValueChange={(value) => setMinutes(value.replace(/\D/g, ''))} />
            </FormGroup>
          </div>
          <FormGroup label="Note" labelFor="bowl-note" helperText={problems.note} intent={problems.note ? Intent.DANGER : Intent.NONE}>
            <TextArea id="bowl-note" fill rows={2} value={note} onChange={(event) => setNote(event.currentTarget.value)} />
          </FormGroup>
          {refusal && (
            <Callout intent={Intent.DANGER} role="alert">
              {refusal}
            </Callout>
          )}
        </div>

        <aside className="tr-bowl-side">
          <section className="tr-bowl-figures" aria-label="Bowl figures">
            <h3 className="tr-bowl-figures-title">As mixed</h3>
            <dl className="tr-figures">
              <dt>Total</dt>
              <dd>{figures ? `${figures.totalGrams} g` : '—'}</dd>
              <dt>Colour &amp; lightener</dt>
              <dd>{figures ? `${figures.colourGrams} g` : '—'}</dd>
              <dt>Developer</dt>
              <dd>{figures ? `${figures.developerGrams} g` : '—'}</dd>
              <dt>Ratio</dt>
              <dd>{ratioText(figures?.ratio ?? null)}</dd>
              <dt>Strength</dt>
              <dd>{figures?.developerVolume && live.developerPercent ? `${plainFigure(figures.developerVolume)} vol (${plainFigure(live.developerPercent)} %)` : '—'}</dd>
              <dt>Product cost</dt>
              <dd>{figures ? figures.cost : '—'}</dd>
              <dt>Waste</dt>
              <dd>{figures ? `${figures.wasteGrams} g · ${figures.wasteCost}` : '—'}</dd>
            </dl>
            <p className="tr-muted tr-bowl-figures-note">Cost at the catalogue’s cost per gram; ounces are weighed ounces (28.349523125 g).</p>
          </section>
          <SafetyCautions patchTest={patchTestNote} />
        </aside>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={record.isPending} />
            <Button type="submit" intent={Intent.PRIMARY} loading={record.isPending} text="Record bowl" />
          </>
        }
      />
    </form>
  );
}
