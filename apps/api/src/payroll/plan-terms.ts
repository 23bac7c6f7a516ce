import { computePay, DomainError, isPeriodStart, type PayCalendar, type PayInput } from '@tressury/domain';
import type { payPlanVersions } from '@tressury/schema';
import type { PayPlanTermsDto } from './dto/pay-plan-terms.dto.js';
import { notPeriodStart } from './payroll-errors.js';

/**
 * Checks terms with the very rules computePay applies (tiers from 0 and increasing, rates within 0..1,
 * a value for the modes that need one) by computing an empty period, so the plan editor and the payroll
 * run can never disagree; the domain's field path `plan.x` becomes `<prefix>.x` (or `x`).
 */
export function checkPlanTerms(terms: PayPlanTermsDto, calendar: PayCalendar, prefix = ''): void {
  const path = (field: string) => (prefix ? `${prefix}.${field}` : field);
  if (!isPeriodStart(calendar, terms.effectiveFrom)) throw notPeriodStart(terms.effectiveFrom, path('effectiveFrom'));
  const needsValue = terms.productCharge.mode === 'percent-of-price' || terms.productCharge.mode === 'fixed-per-colour-service';
  if (needsValue && terms.productCharge.value === undefined) {
    throw new DomainError('pay_plan.invalid', `A ${terms.productCharge.mode} product charge needs a value.`, 'invalid', path('productCharge.value'));
  }
  try {
    computePay({
      plan: planOf(terms),
      serviceLines: [],
      retailLines: [],
      tips: [],
      hours: [],
      wageRules: { minimumWage: '0', overtimeAfterHours: '40', overtimeMultiplier: '1.5', workweekStartsOn: 0, commissionExemption: false },
    });
  } catch (error) {
    if (error instanceof DomainError && error.field?.startsWith('plan.')) {
      throw new DomainError('pay_plan.invalid', error.message.replaceAll(error.field, path(error.field.slice(5))), 'invalid', path(error.field.slice(5)));
    }
    throw error;
  }
}

function planOf(terms: PayPlanTermsDto): PayInput['plan'] {
  const { mode, value, markup } = terms.productCharge;
  return {
    tierMode: terms.tierMode,
    tiers: terms.tiers.map((t) => ({ from: t.from, rate: t.rate })),
    productCharge: { mode, ...(value !== undefined ? { value } : {}), ...(markup !== undefined ? { markup } : {}) },
    retailRate: terms.retailRate,
    ...(terms.hourlyRate !== undefined ? { hourlyRate: terms.hourlyRate } : {}),
  };
}

export const versionValues = (planId: string, terms: PayPlanTermsDto, createdById: string): typeof payPlanVersions.$inferInsert => ({
  planId,
  effectiveFrom: terms.effectiveFrom,
  tierMode: terms.tierMode,
  tiers: terms.tiers.map((t) => ({ from: t.from, rate: t.rate })),
  productChargeMode: terms.productCharge.mode,
  productChargeValue: terms.productCharge.value ?? null,
  productChargeMarkup: terms.productCharge.markup ?? null,
  retailRate: terms.retailRate,
  hourlyRate: terms.hourlyRate ?? null,
  createdById,
});
