import { type CommissionPreview, type CommissionSample, commissionPreview, DomainError, parseDecimal, type PayInput } from '@tressury/domain';
import { ApiError } from '../../../lib/api-error';
import type { PayPlanTerms, PayPlanVersion } from '../api/pay-plan-queries';

export type TierMode = PayPlanVersion['tierMode'];
export type ChargeMode = PayPlanVersion['productCharge']['mode'];
export type TierRow = { key: string; from: string; ratePercent: string };

/** What the editor holds: rates as the percentages people type, amounts as typed. */
export type PlanFormValues = {
  name: string;
  effectiveFrom: string;
  tierMode: TierMode;
  tiers: TierRow[];
  chargeMode: ChargeMode;
  markupPercent: string;
  pricePercent: string;
  fixedAmount: string;
  retailPercent: string;
  hourlyRate: string;
};

/** Problems by the API's own field path without its `terms.` prefix: `tiers[1].rate`, `retailRate`, `name`… */
export type Problems = Record<string, string>;

let rowCount = 0;
export const tierRow = (from = '', ratePercent = ''): TierRow => ({ key: `tier-${++rowCount}`, from, ratePercent });

/** "0.4" → "40": the API's fraction as the percentage shown, exactly. */
export const percentOf = (fraction: string): string => parseDecimal(fraction, 'rate').times(100).toFixed();

// A fresh plan starts from one flat tier; 40 % and 10 % retail are common starting points in the trade, not advice.
export function formValuesOf(version?: PayPlanVersion, effectiveFrom = ''): PlanFormValues {
  if (!version) {
    return {
      name: '',
      effectiveFrom,
      tierMode: 'marginal',
      tiers: [tierRow('0', '40')],
      chargeMode: 'none',
      markupPercent: '0',
      pricePercent: '',
      fixedAmount: '',
      retailPercent: '10',
      hourlyRate: '',
    };
  }
  const { mode, value, markup } = version.productCharge;
  return {
    name: '',
    effectiveFrom,
    tierMode: version.tierMode,
    tiers: version.tiers.map((t) => tierRow(t.from, percentOf(t.rate))),
    chargeMode: mode,
    markupPercent: markup === null ? '0' : percentOf(markup),
    pricePercent: mode === 'percent-of-price' && value !== null ? percentOf(value) : '',
    fixedAmount: mode === 'fixed-per-colour-service' && value !== null ? value : '',
    retailPercent: percentOf(version.retailRate),
    hourlyRate: version.hourlyRate ?? '',
  };
}

const PERCENT = /^\d{1,4}(\.\d{1,2})?$/;
const AMOUNT = /^\d{1,9}(\.\d{1,2})?$/;

type Read = { value?: string; problem?: string; missing?: boolean };

/** A percentage as typed ("42.5", "42.5 %") to the API's fraction ("0.425"). */
function readPercent(text: string, max: number, what: string): Read {
  const typed = text.trim().replace(/\s*%$/, '');
  if (typed === '') return { problem: `Give the ${what} as a percentage, such as 40.`, missing: true };
  if (!PERCENT.test(typed)) return { problem: `Write the ${what} as a percentage with at most two decimals, such as 42.5.` };
  const percent = parseDecimal(typed, what);
  if (percent.gt(max)) return { problem: `The ${what} can be at most ${max} %.` };
  return { value: percent.div(100).toFixed() };
}

function readAmount(text: string, what: string, optional = false): Read {
  const typed = text.trim();
  if (typed === '') return optional ? {} : { problem: `Give the ${what}, such as 1500.`, missing: true };
  if (!AMOUNT.test(typed)) return { problem: `Write the ${what} as an amount with at most two decimals, such as 1500 or 12.50.` };
  return { value: typed };
}

export type ReadTerms = { terms: Omit<PayPlanTerms, 'effectiveFrom'> | null; problems: Problems; missing: Set<string> };

/** The form's values as the API's terms, or the problems that keep them from being sent (by API field path). */
export function readTerms(values: PlanFormValues): ReadTerms {
  const problems: Problems = {};
  const missing = new Set<string>();
  const take = (field: string, read: Read): string | undefined => {
    if (read.problem) problems[field] = read.problem;
    if (read.missing) missing.add(field);
    return read.value;
  };
  const tiers = values.tiers.map((row, i) => ({
    from: i === 0 ? '0' : take(`tiers[${i}].from`, readAmount(row.from, 'revenue this tier starts from')),
    rate: take(`tiers[${i}].rate`, readPercent(row.ratePercent, 100, 'rate')),
  }));
  let productCharge: PayPlanTerms['productCharge'] = { mode: values.chargeMode };
  if (values.chargeMode === 'actual-cost') {
    const markup = values.markupPercent.trim() === '' ? '0' : take('productCharge.markup', readPercent(values.markupPercent, 1000, 'markup'));
    productCharge = { mode: 'actual-cost', markup };
  } else if (values.chargeMode === 'percent-of-price') {
    productCharge = { mode: 'percent-of-price', value: take('productCharge.value', readPercent(values.pricePercent, 100, 'share of the price')) };
  } else if (values.chargeMode === 'fixed-per-colour-service') {
    productCharge = { mode: 'fixed-per-colour-service', value: take('productCharge.value', readAmount(values.fixedAmount, 'amount per colour service')) };
  }
  const retailRate = take('retailRate', readPercent(values.retailPercent, 100, 'retail rate'));
  const hourlyRate = take('hourlyRate', readAmount(values.hourlyRate, 'hourly rate', true));
  if (Object.keys(problems).length > 0) return { terms: null, problems, missing };
  return {
    terms: {
      tierMode: values.tierMode,
      tiers: tiers as { from: string; rate: string }[],
      productCharge,
      retailRate: retailRate!,
      ...(hourlyRate !== undefined ? { hourlyRate } : {}),
    },
    problems,
    missing,
  };
}

const labels: Record<string, string> = {
  from: 'The starting revenue',
  rate: 'The rate',
  tiers: 'The tiers',
  markup: 'The markup',
  value: 'The charge',
  mode: 'The product charge',
  retailRate: 'The retail rate',
  hourlyRate: 'The hourly rate',
  effectiveFrom: 'The start',
  tierMode: 'How tiers apply',
  name: 'The name',
};

/** A domain or API message about `field` in the form's own words: its path ("plan.tiers[1].from") becomes a label. */
export function plainProblem(field: string, message: string): string {
  const last = field.split('.').pop()?.replace(/\[\d+\]$/, '') ?? field;
  const label = labels[last] ?? 'This value';
  const escaped = field.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const named = message.replace(new RegExp(`\\b(plan|terms)\\.${escaped}\\b|^${escaped}\\b`, 'g'), label);
  return named.startsWith(`${last} `) ? `${label}${named.slice(last.length)}` : named;
}

/** The API's field errors on the editor by the form's keys (its `terms.` prefix dropped). */
export function serverProblems(error: unknown): Problems {
  const found: Problems = {};
  if (!(error instanceof ApiError)) return found;
  for (const { field, message } of error.details) {
    const key = field.replace(/^terms\./, '');
    const text = plainProblem(key, message);
    found[key] = found[key] ? `${found[key]} ${text}` : text;
  }
  return found;
}

export type PreviewOutcome = { preview: CommissionPreview; problems: Problems } | { preview: null; problems: Problems };

/**
 * The commission the terms pay on the sample, by libs/domain's own rules; a rule the terms break comes back on
 * the field it names (`tiers[1].from`), a bad sample figure under `sample.*`.
 */
export function previewOf(terms: ReadTerms['terms'], sample: CommissionSample): PreviewOutcome {
  if (!terms) return { preview: null, problems: {} };
  try {
    return { preview: commissionPreview(terms as PayInput['plan'], sample), problems: {} };
  } catch (error) {
    if (!(error instanceof DomainError)) throw error;
    const field = error.field?.replace(/^plan\./, '') ?? 'terms';
    return { preview: null, problems: { [field]: plainProblem(field, error.message) } };
  }
}

const digits = (whole: string): string => whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');

/** "12345.5" → "12,345.50": a money figure as shown, from its decimal string (no float on the way). */
export function moneyText(amount: string): string {
  const fixed = parseDecimal(amount, 'amount').toFixed(2);
  const negative = fixed.startsWith('-');
  const [whole = '0', cents = '00'] = (negative ? fixed.slice(1) : fixed).split('.');
  return `${negative ? '−' : ''}${digits(whole)}.${cents}`;
}

/** "0.425" → "42.5 %". */
export const percentText = (fraction: string): string => `${percentOf(fraction)}\u00a0%`;

const chargeText = (charge: PayPlanVersion['productCharge']): string => {
  switch (charge.mode) {
    case 'none':
      return 'no colour product charge';
    case 'actual-cost':
      return charge.markup && !parseDecimal(charge.markup, 'markup').eq(0) ? `colour product at cost + ${percentText(charge.markup)}` : 'colour product at cost';
    case 'percent-of-price':
      return `${percentText(charge.value ?? '0')} of each colour service’s price`;
    case 'fixed-per-colour-service':
      return `${moneyText(charge.value ?? '0')} per colour service`;
  }
};

export const tierModeNames: Record<TierMode, string> = {
  marginal: 'Band by band',
  'whole-period': 'Whole period at the top rate reached',
};

/** One version's terms on one line, as the plans list shows them. */
export function termsLine(version: PayPlanVersion): string {
  const tiers = version.tiers.map((t, i) => (i === 0 ? percentText(t.rate) : `${percentText(t.rate)} from ${moneyText(t.from)}`)).join(', ');
  const parts = [
    // With one tier the two modes pay alike: no need to name one.
    version.tiers.length === 1 ? `${tiers} of service revenue` : `${tierModeNames[version.tierMode]}: ${tiers}`,
    chargeText(version.productCharge),
    `retail ${percentText(version.retailRate)}`,
    ...(version.hourlyRate !== null ? [`${moneyText(version.hourlyRate)} an hour`] : []),
  ];
  return parts.join(' · ');
}
