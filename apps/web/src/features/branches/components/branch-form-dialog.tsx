import { Button, Checkbox, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent } from '@blueprintjs/core';
import { type FormEvent, type ReactNode, useEffect, useMemo, useRef, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { Branch } from '../api/branch-queries';
import { useCreateBranch } from '../api/use-create-branch';
import { useUpdateBranch } from '../api/use-update-branch';
import { percentText } from './branch-figures';
import { type BranchField, type BranchFormValues, changesOf, formValuesOf, isBranchField, payloadOf } from './branch-form-values';
import './branch-form-dialog.css';

type Problems = Partial<Record<BranchField, string>>;

// Form order, top to bottom, so the first refused field is the first one the eye meets.
const formOrder: BranchField[] = [
  'name',
  'timeZone',
  'currency',
  'minimumWage',
  'retailTaxRate',
  'overtimeAfterHours',
  'overtimeMultiplier',
  'commissionExemption',
  'varianceNoteThreshold',
  'patchTestMaxAgeDays',
  'royaltyRate',
  'marketingFundRate',
];

const fieldId = (field: BranchField) => `branch-${field}`;
const helpId = (field: BranchField) => `branch-${field}-help`;

function timeZonesWith(current: string): string[] {
  const zones = Intl.supportedValuesOf('timeZone');
  return current && !zones.includes(current) ? [current, ...zones] : zones;
}

type Props = { isOpen: boolean; branch?: Branch; onClose: () => void };

/** One form for a new branch and for changing one; `branch` given means editing it. */
export function BranchFormDialog({ isOpen, branch, onClose }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={branch ? `Edit ${branch.name}` : 'New branch'} className="tr-branch-dialog">
      {isOpen && <BranchForm key={branch?.id ?? 'new'} branch={branch} onDone={onClose} />}
    </Dialog>
  );
}

function BranchForm({ branch, onDone }: { branch?: Branch; onDone: () => void }) {
  const create = useCreateBranch();
  const update = useUpdateBranch();
  const [values, setValues] = useState(() => formValuesOf(branch));
  const [problems, setProblems] = useState<Problems>({});
  const formRef = useRef<HTMLFormElement>(null);
  const justRefused = useRef(false);
  const zones = useMemo(() => timeZonesWith(values.timeZone), [values.timeZone]);
  const pending = create.isPending || update.isPending;

  // Only right after a refusal: fixing one field must not pull focus to another.
  useEffect(() => {
    if (!justRefused.current) return;
    justRefused.current = false;
    const first = formOrder.find((name) => problems[name]);
    if (first) formRef.current?.querySelector<HTMLElement>(`#${fieldId(first)}`)?.focus();
  }, [problems]);

  const set = <F extends BranchField>(field: F, value: BranchFormValues[F]) => {
    setValues((current) => ({ ...current, [field]: value }));
    setProblems((current) => {
      const rest = { ...current };
      delete rest[field];
      return rest;
    });
  };

  const refused = (error: unknown) => {
    const onFields: Problems = {};
    if (error instanceof ApiError) {
      for (const { field, message } of error.details) {
        if (isBranchField(field)) onFields[field] = onFields[field] ? `${onFields[field]} ${message}` : message;
      }
    }
    if (Object.keys(onFields).length > 0) {
      justRefused.current = true;
      setProblems(onFields);
    } else void showToast({ intent: Intent.DANGER, message: errorMessage(error) });
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const trimmed = Object.fromEntries(
      Object.entries(values).map(([field, value]) => [field, typeof value === 'string' ? value.trim() : value]),
    ) as BranchFormValues;
    if (!branch) {
      create.mutate(payloadOf(trimmed), {
        onSuccess: (created) => {
          void showToast({ intent: Intent.SUCCESS, message: `Branch ${created.name} added.` });
          onDone();
        },
        onError: refused,
      });
      return;
    }
    const changes = changesOf(branch, trimmed);
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate(
      { id: branch.id, changes },
      {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Changes to ${saved.name} saved.` });
          onDone();
        },
        onError: refused,
      },
    );
  };

  const field = (name: BranchField, label: string, hint: ReactNode, control: (a11y: FieldA11y) => ReactNode) => (
    <FormGroup
      label={label}
      labelFor={fieldId(name)}
      intent={problems[name] ? Intent.DANGER : Intent.NONE}
      helperText={<span id={helpId(name)}>{problems[name] ?? hint}</span>}
    >
      {control({ id: fieldId(name), 'aria-describedby': helpId(name), 'aria-invalid': problems[name] ? true : undefined })}
    </FormGroup>
  );

  const text = (name: Exclude<BranchField, 'commissionExemption' | 'timeZone'>, extra?: { autoFocus?: boolean; inputMode?: 'decimal' }) =>
    (a11y: FieldA11y) => (
      <InputGroup
        {...a11y}
        {...extra}
        intent={problems[name] ? Intent.DANGER : Intent.NONE}
        value={values[name]}
        onValueChange={(value) => set(name, name === 'currency' ? value.toUpperCase() : value)}
      />
    );

  const taxPercent = percentText(values.retailTaxRate);

  return (
    <form ref={formRef} onSubmit={submit} noValidate>
      <DialogBody>
        {field('name', 'Name', 'How staff and reports refer to this branch.', text('name', { autoFocus: true }))}
        <div className="tr-form-row">
          {field('timeZone', 'Time zone', 'Business dates are counted in this zone.', (a11y) => (
            <HTMLSelect {...a11y} fill className={problems.timeZone ? 'tr-select-invalid' : undefined} value={values.timeZone} onChange={(event) => set('timeZone', event.currentTarget.value)}>
              {!values.timeZone && <option value="">Choose a time zone</option>}
              {zones.map((zone) => (
                <option key={zone} value={zone}>
                  {zone.replaceAll('_', ' ')}
                </option>
              ))}
            </HTMLSelect>
          ))}
          {field('currency', 'Currency', 'Three-letter code, such as USD.', text('currency'))}
        </div>
        <div className="tr-form-row">
          {field('minimumWage', 'Minimum wage', 'Per hour, in the branch currency.', text('minimumWage', { inputMode: 'decimal' }))}
          {field('retailTaxRate', 'Retail tax rate', taxPercent === null ? 'As a fraction: 0.0825 is 8.25 %.' : `As a fraction: ${values.retailTaxRate.trim()} is ${taxPercent} %.`, text('retailTaxRate', { inputMode: 'decimal' }))}
        </div>
        <div className="tr-form-row">
          {field('overtimeAfterHours', 'Overtime after (hours)', 'Hours in a workweek before overtime is due.', text('overtimeAfterHours', { inputMode: 'decimal' }))}
          {field('overtimeMultiplier', 'Overtime multiplier', '1.5 is time and a half.', text('overtimeMultiplier', { inputMode: 'decimal' }))}
        </div>
        <div className="tr-form-row">
          {field('varianceNoteThreshold', 'Day-close note above', 'A cash or card difference larger than this needs a note when the day is closed.', text('varianceNoteThreshold', { inputMode: 'decimal' }))}
          {field('patchTestMaxAgeDays', 'Patch test valid for (days)', "How long a client's patch test counts before colour needs a confirmation. Licensed practice and local codes govern.", text('patchTestMaxAgeDays', { inputMode: 'decimal' }))}
        </div>
        <div className="tr-form-row">
          {field('royaltyRate', 'Royalty (% of gross sales)', 'The franchise royalty on the month’s gross sales: 6 means 6 %. 0 when none is due.', text('royaltyRate', { inputMode: 'decimal' }))}
          {field('marketingFundRate', 'Marketing fund (% of gross sales)', 'The marketing-fund contribution on the same sales. The franchise agreement governs both.', text('marketingFundRate', { inputMode: 'decimal' }))}
        </div>
        <FormGroup
          intent={problems.commissionExemption ? Intent.DANGER : Intent.NONE}
          helperText={
            <span id={helpId('commissionExemption')}>
              {problems.commissionExemption ??
                'Commission-paid staff of a retail or service business may be exempt from overtime when the conditions of 29 U.S.C. 207(i) are met. Confirm with your payroll professional.'}
            </span>
          }
        >
          <Checkbox
            className="tr-check"
            id={fieldId('commissionExemption')}
            aria-describedby={helpId('commissionExemption')}
            label="Apply the commission overtime exemption"
            checked={values.commissionExemption}
            onChange={(event) => set('commissionExemption', event.currentTarget.checked)}
          />
        </FormGroup>
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={pending} />
            <Button type="submit" intent={Intent.PRIMARY} loading={pending} text={branch ? 'Save changes' : 'Create branch'} />
          </>
        }
      />
    </form>
  );
}

type FieldA11y = { id: string; 'aria-describedby': string; 'aria-invalid': true | undefined };
