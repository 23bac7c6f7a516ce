import type Big from 'big.js';

export type TierMode = 'marginal' | 'whole-period';
export type ProductChargeMode = 'none' | 'actual-cost' | 'percent-of-price' | 'fixed-per-colour-service';
export type Weekday = 0 | 1 | 2 | 3 | 4 | 5 | 6;

export type PayInput = {
  plan: {
    tierMode: TierMode;
    tiers: { from: string; rate: string }[];
    productCharge: { mode: ProductChargeMode; value?: string; markup?: string };
    retailRate: string;
    hourlyRate?: string;
  };
  serviceLines: { id: string; date: string; price: string; isColour: boolean; productCost: string; share?: string }[];
  /**
   * Corrections of the product charge booked after a day was closed (e.g. a bowl left off a ticket): added to
   * the period's charge as they are, whatever the plan's rule, since the amount booked is the charge itself.
   */
  productChargeAdjustments?: { id: string; date: string; amount: string }[];
  retailLines: { id: string; date: string; amount: string }[];
  tips: { date: string; amount: string }[];
  hours: { date: string; hours: string }[];
  wageRules: {
    minimumWage: string;
    overtimeAfterHours: string;
    overtimeMultiplier: string;
    workweekStartsOn: Weekday;
    commissionExemption: boolean;
  };
};

export type PayResult = {
  serviceRevenue: string;
  productCharge: string;
  commissionableRevenue: string;
  tierBreakdown: { from: string; to: string | null; rate: string; base: string; commission: string }[];
  serviceCommission: string;
  retailCommission: string;
  hourlyPay: string;
  tips: string;
  workweeks: {
    start: string;
    hours: string;
    earnings: string;
    regularRate: string;
    minimumWageTopUp: string;
    overtimeHours: string;
    overtimePremium: string;
    exempt: boolean;
  }[];
  minimumWageTopUp: string;
  overtimePremium: string;
  grossPay: string;
};

/** PayInput after validation: every figure a Big, every date a day number (days since 1970-01-01). */
export type Tier = { from: Big; rate: Big };
export type ProductChargeRule = { mode: ProductChargeMode; value: Big; markup: Big };
export type ServiceLine = { price: Big; isColour: boolean; productCost: Big; share: Big };
export type HoursEntry = { day: number; hours: Big };
export type WageRules = {
  minimumWage: Big;
  overtimeAfterHours: Big;
  overtimeMultiplier: Big;
  workweekStartsOn: Weekday;
  commissionExemption: boolean;
};
export type ValidPayInput = {
  tierMode: TierMode;
  tiers: Tier[];
  productCharge: ProductChargeRule;
  retailRate: Big;
  hourlyRate: Big;
  serviceLines: ServiceLine[];
  chargeAdjustments: Big[];
  retailAmounts: Big[];
  tipAmounts: Big[];
  hours: HoursEntry[];
  wageRules: WageRules;
};
