import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, Radio, RadioGroup } from '@blueprintjs/core';
import { type FormEvent, type ReactNode, useEffect, useMemo, useRef, useState } from 'react';
import { businessDateText } from '../../../lib/business-date';
import { errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { PayPlan, PayPlanVersion } from '../api/pay-plan-queries';
import { useAddPayPlanVersion } from '../api/use-add-pay-plan-version';
import { useCreatePayPlan } from '../api/use-create-pay-plan';
import type { PeriodChoice } from './plan-periods';
import {
  type ChargeMode,
  formValuesOf,
  type PlanFormValues,
  previewOf,
  type Problems,
  readTerms,
  serverProblems,
  termsLine,
  type TierMode,
  tierModeNames,
} from './plan-terms-values';
import { TierPreview, sampleOf, sampleStart, type SampleValues } from './tier-preview';
import { TierTable, tierFieldId } from './tier-table';
import './plan-editor.css';

type Props = {
  isOpen: boolean;
  /** Given: new terms for this plan (or, read-only, its terms). Left out: a new plan. */
  plan?: PayPlan;
  /** The version the form starts from: the one in force now. */
  startFrom?: PayPlanVersion;
  readOnly: boolean;
  choices: PeriodChoice[];
  defaultStart: string;
  onClose: () => void;
};

export function PlanEditor({ isOpen, plan, readOnly, onClose, ...rest }: Props) {
  const title = readOnly ? `${plan?.name ?? 'Plan'}: terms` : plan ? `New terms for ${plan.name}` : 'New pay plan';
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={title} className="tr-plan-dialog">
      {isOpen && <PlanForm plan={plan} readOnly={readOnly} onDone={onClose} {...rest} />}
    </Dialog>
  );
}

const tierModeNotes: Record<TierMode, string> = {
  marginal: 'Each band of the period’s revenue earns its own rate: only the revenue above a threshold earns the higher rate.',
  'whole-period':
    'All of the period’s revenue earns the rate of the highest tier reached. Mind the cliff: one sale that crosses a threshold raises the rate on everything sold before it, and a refund that drops below it lowers it again.',
};

const chargeModeNames: Record<ChargeMode, string> = {
  none: 'No charge',
  'actual-cost': 'Product cost (+ markup)',
  'percent-of-price': 'Share of the service price',
  'fixed-per-colour-service': 'Fixed amount per service',
};

const isFormField = (field: string) => /^(name|effectiveFrom|tierMode|tiers(\[\d+\]\.(from|rate))?|productCharge(\.\w+)?|retailRate|hourlyRate)$/.test(field);

const idOf = (field: string): string | null => {
  const tier = /^tiers\[(\d+)\]\.(from|rate)$/.exec(field);
  if (tier) return tierFieldId(Number(tier[1]), tier[2] as 'from' | 'rate');
  return ({ name: 'plan-name', effectiveFrom: 'plan-start', 'productCharge.markup': 'plan-charge-value', 'productCharge.value': 'plan-charge-value', retailRate: 'plan-retail', hourlyRate: 'plan-hourly' } as Record<string, string>)[field] ?? null;
};

function PlanForm({ plan, startFrom, readOnly, choices, defaultStart, onDone }: Omit<Props, 'isOpen' | 'onClose'> & { onDone: () => void }) {
  const create = useCreatePayPlan();
  const addVersion = useAddPayPlanVersion();
  const [values, setValues] = useState<PlanFormValues>(() => formValuesOf(startFrom, defaultStart));
  const [sample, setSample] = useState<SampleValues>(sampleStart);
  const [attempted, setAttempted] = useState(false);
  const [fromServer, setFromServer] = useState<Problems>({});
  const [refusal, setRefusal] = useState<string | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const focusFirst = useRef(false);
  const pending = create.isPending || addVersion.isPending;

  const read = useMemo(() => readTerms(values), [values]);
  const outcome = useMemo(() => previewOf(read.terms, sampleOf(sample)), [read.terms, sample]);
  const nameProblem = !plan && values.name.trim() === '' ? 'Give the plan a name, such as “Colour team”.' : undefined;

  // Problems on the terms: the server's after a refusal, else what the form and the pay rules find as one types;
  // an empty field is only flagged once saving was tried.
  const problemOf = (field: string): string | undefined => {
    if (fromServer[field]) return fromServer[field];
    if (field === 'name') return attempted ? nameProblem : undefined;
    const local = read.problems[field];
    if (local) return attempted || !read.missing.has(field) ? local : undefined;
    return field.startsWith('sample.') ? undefined : outcome.problems[field];
  };
  const problems: Problems = {};
  for (const field of [
    'name',
    'effectiveFrom',
    'tierMode',
    'tiers',
    ...values.tiers.flatMap((_, i) => [`tiers[${i}].from`, `tiers[${i}].rate`]),
    'productCharge.mode',
    'productCharge.value',
    'productCharge.markup',
    'retailRate',
    'hourlyRate',
  ]) {
    const problem = problemOf(field);
    if (problem) problems[field] = problem;
  }

  useEffect(() => {
    if (!focusFirst.current) return;
    focusFirst.current = false;
    const id = Object.keys(problems).map(idOf).find((found) => found !== null);
    if (id) formRef.current?.querySelector<HTMLElement>(`#${id}`)?.focus();
  });

  const set = (changes: Partial<PlanFormValues>) => {
    setValues((current) => ({ ...current, ...changes }));
    setFromServer((current) => {
      const touched = Object.keys(changes);
      const rest: Problems = {};
      for (const [field, message] of Object.entries(current)) {
        const hit = touched.some(
          (key) =>
            (key === 'tiers' && field.startsWith('tiers')) ||
            (key === 'chargeMode' && field.startsWith('productCharge')) ||
            (['markupPercent', 'pricePercent', 'fixedAmount'].includes(key) && field.startsWith('productCharge')) ||
            (key === 'retailPercent' && field === 'retailRate') ||
            key === field,
        );
        if (!hit) rest[field] = message;
      }
      return rest;
    });
    setRefusal(null);
  };

  const refused = (error: unknown) => {
    const found = serverProblems(error);
    const onForm = Object.fromEntries(Object.entries(found).filter(([field]) => isFormField(field)));
    setFromServer(onForm);
    setRefusal(Object.keys(onForm).length > 0 ? null : errorMessage(error));
    focusFirst.current = true;
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (readOnly) return;
    setAttempted(true);
    const planProblems = Object.keys(outcome.problems).some((field) => !field.startsWith('sample.'));
    if (!read.terms || planProblems || nameProblem) {
      focusFirst.current = true;
      return;
    }
    const terms = { ...read.terms, effectiveFrom: values.effectiveFrom };
    const saved = (text: string) => {
      void showToast({ intent: Intent.SUCCESS, message: text });
      onDone();
    };
    if (plan) {
      addVersion.mutate(
        { planId: plan.id, terms },
        { onSuccess: () => saved(`New terms for ${plan.name} from ${businessDateText(terms.effectiveFrom)}.`), onError: refused },
      );
    } else {
      create.mutate({ name: values.name.trim(), terms }, { onSuccess: (made) => saved(`Pay plan “${made.name}” created.`), onError: refused });
    }
  };

  const waiting = read.terms
    ? null
    : Object.keys(read.problems).some((field) => !read.missing.has(field))
      ? 'Correct the marked figures to see the preview.'
      : 'The preview appears once every tier has its revenue and rate.';

  const field = (name: string, id: string, label: string, hint: ReactNode, control: ReactNode, className?: string) => (
    <FormGroup
      className={className}
      label={label}
      labelFor={id}
      intent={problems[name] ? Intent.DANGER : Intent.NONE}
      helperText={<span id={`${id}-help`}>{problems[name] ?? hint}</span>}
    >
      {control}
    </FormGroup>
  );
  const a11y = (name: string, id: string) => ({ id, 'aria-describedby': `${id}-help`, 'aria-invalid': problems[name] ? (true as const) : undefined });

  const chargeValue =
    values.chargeMode === 'actual-cost'
      ? { label: 'Markup on cost', key: 'markupPercent' as const, field: 'productCharge.markup', unit: '%', hint: 'Added to the cost: 10 means cost + 10 %. 0 for cost alone.' }
      : values.chargeMode === 'percent-of-price'
        ? { label: 'Share of the price', key: 'pricePercent' as const, field: 'productCharge.value', unit: '%', hint: 'Of each colour service’s price.' }
        : values.chargeMode === 'fixed-per-colour-service'
          ? { label: 'Amount per colour service', key: 'fixedAmount' as const, field: 'productCharge.value', unit: null, hint: 'Taken off each colour service.' }
          : null;

  return (
    <form ref={formRef} onSubmit={submit} noValidate>
      <DialogBody className="tr-plan-body">
        <div className="tr-plan-terms">
          {!plan &&
            field(
              'name',
              'plan-name',
              'Name',
              'As the staff and the accountant will see it.',
              <InputGroup {...a11y('name', 'plan-name')} autoFocus value={values.name} onValueChange={(name) => set({ name })} />,
            )}
          {readOnly ? (
            <p className="tr-plan-readonly-note">
              {startFrom ? `The terms in force since ${businessDateText(startFrom.effectiveFrom)}. ` : ''}Only the owner changes pay plans.
            </p>
          ) : (
            field(
              'effectiveFrom',
              'plan-start',
              'Takes effect from',
              'The terms apply from the first day of this pay period. Payroll runs already approved keep the figures they were approved with and never change, so periods up to the last approved one are not offered.',
              <HTMLSelect {...a11y('effectiveFrom', 'plan-start')} fill value={values.effectiveFrom} onChange={(event) => set({ effectiveFrom: event.currentTarget.value })}>
                {choices.map((choice) => (
                  <option key={choice.startDate} value={choice.startDate}>
                    {choice.label}
                  </option>
                ))}
              </HTMLSelect>,
            )
          )}
          <RadioGroup
            className="tr-plan-modes"
            label="How the tiers apply"
            disabled={readOnly}
            selectedValue={values.tierMode}
            onChange={(event) => set({ tierMode: event.currentTarget.value as TierMode })}
          >
            {(['marginal', 'whole-period'] as const).map((mode) => (
              <Radio key={mode} value={mode} className="tr-plan-mode">
                <strong>{tierModeNames[mode]}</strong>
                <span className="tr-plan-mode-note">{tierModeNotes[mode]}</span>
              </Radio>
            ))}
          </RadioGroup>
          <TierTable rows={values.tiers} onChange={(tiers) => set({ tiers })} problems={problems} readOnly={readOnly} />
          <div className="tr-plan-row">
            {field(
              'productCharge.mode',
              'plan-charge',
              'Colour product charge',
              'Taken off each colour service’s revenue before commission.',
              <HTMLSelect
                {...a11y('productCharge.mode', 'plan-charge')}
                fill
                disabled={readOnly}
                value={values.chargeMode}
                onChange={(event) => set({ chargeMode: event.currentTarget.value as ChargeMode })}
              >
                {(Object.keys(chargeModeNames) as ChargeMode[]).map((mode) => (
                  <option key={mode} value={mode}>
                    {chargeModeNames[mode]}
                  </option>
                ))}
              </HTMLSelect>,
            )}
            {chargeValue &&
              field(
                chargeValue.field,
                'plan-charge-value',
                chargeValue.label,
                chargeValue.hint,
                <InputGroup
                  {...a11y(chargeValue.field, 'plan-charge-value')}
                  inputMode="decimal"
                  readOnly={readOnly}
                  className="tr-plan-figure-input"
                  rightElement={chargeValue.unit ? <span className="tr-tier-unit">{chargeValue.unit}</span> : undefined}
                  value={values[chargeValue.key]}
                  onValueChange={(text) => set({ [chargeValue.key]: text })}
                />,
              )}
          </div>
          <div className="tr-plan-row">
            {field(
              'retailRate',
              'plan-retail',
              'Retail rate',
              'Commission on retail products sold.',
              <InputGroup
                {...a11y('retailRate', 'plan-retail')}
                inputMode="decimal"
                readOnly={readOnly}
                className="tr-plan-figure-input"
                rightElement={<span className="tr-tier-unit">%</span>}
                value={values.retailPercent}
                onValueChange={(retailPercent) => set({ retailPercent })}
              />,
            )}
            {field(
              'hourlyRate',
              'plan-hourly',
              'Hourly rate (optional)',
              'Paid for every hour worked on top of commission; a staff member’s own hourly rate wins over this.',
              <InputGroup
                {...a11y('hourlyRate', 'plan-hourly')}
                inputMode="decimal"
                readOnly={readOnly}
                className="tr-plan-figure-input"
                placeholder="none"
                value={values.hourlyRate}
                onValueChange={(hourlyRate) => set({ hourlyRate })}
              />,
            )}
          </div>
          {plan && plan.versions.length > 0 && (
            <details className="tr-plan-history">
              <summary>Terms history ({plan.versions.length})</summary>
              <ul>
                {[...plan.versions].reverse().map((version) => (
                  <li key={version.id}>
                    <span className="tr-nowrap">From {businessDateText(version.effectiveFrom)}:</span> {termsLine(version)}
                  </li>
                ))}
              </ul>
            </details>
          )}
          {refusal && (
            <Callout intent={Intent.DANGER} role="alert">
              {refusal}
            </Callout>
          )}
        </div>
        <TierPreview sample={sample} onSampleChange={setSample} outcome={outcome} tierMode={values.tierMode} waiting={waiting} />
      </DialogBody>
      <DialogFooter
        actions={
          readOnly ? (
            <Button text="Close" onClick={onDone} />
          ) : (
            <>
              <Button text="Cancel" onClick={onDone} disabled={pending} />
              <Button type="submit" intent={Intent.PRIMARY} loading={pending} text={plan ? 'Save new terms' : 'Create plan'} />
            </>
          )
        }
      />
    </form>
  );
}
