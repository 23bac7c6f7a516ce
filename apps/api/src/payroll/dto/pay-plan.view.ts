import type { PayPlanAssignmentRow, PayPlanRow, PayPlanVersionRow } from '@tressury/schema';
import Big from 'big.js';

const plain = (value: string | null): string | null => (value === null ? null : new Big(value).toFixed());

export class PayPlanVersionView {
  id: string;
  effectiveFrom: string;
  tierMode: 'marginal' | 'whole-period';
  tiers: { from: string; rate: string }[];
  productCharge: { mode: 'none' | 'actual-cost' | 'percent-of-price' | 'fixed-per-colour-service'; value: string | null; markup: string | null };
  retailRate: string;
  hourlyRate: string | null;
}

export class PayPlanAssignmentView {
  staffId: string;
  effectiveFrom: string;
}

export class PayPlanView {
  id: string;
  name: string;
  /** Every version, earliest first. */
  versions: PayPlanVersionView[];
  /** Staff put on this plan, by the first day it applies. */
  assignments: PayPlanAssignmentView[];
}

export function toPayPlanVersionView(row: PayPlanVersionRow): PayPlanVersionView {
  return {
    id: row.id,
    effectiveFrom: row.effectiveFrom,
    tierMode: row.tierMode,
    tiers: row.tiers,
    productCharge: { mode: row.productChargeMode, value: plain(row.productChargeValue), markup: plain(row.productChargeMarkup) },
    retailRate: plain(row.retailRate)!,
    hourlyRate: row.hourlyRate,
  };
}

export function toPayPlanView(plan: PayPlanRow, versions: PayPlanVersionRow[], assignments: PayPlanAssignmentRow[]): PayPlanView {
  return {
    id: plan.id,
    name: plan.name,
    versions: versions.map(toPayPlanVersionView),
    assignments: assignments.map((a) => ({ staffId: a.staffId, effectiveFrom: a.effectiveFrom })),
  };
}
