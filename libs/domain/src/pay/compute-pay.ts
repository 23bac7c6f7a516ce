import Big from 'big.js';
import { moneyOf, moneyText, sum } from '../money.js';
import { serviceTotals } from './product-charge.js';
import { tierCommission } from './tiers.js';
import type { PayInput, PayResult } from './types.js';
import { validatePayInput } from './validate-pay-input.js';
import { computeWorkweeks, groupHoursByWeek } from './workweeks.js';

// Defaults are US federal; local law governs and every rate comes from the input. The figures follow the
// configured rules and are to be confirmed by a payroll professional.

/** One stylist's pay for one pay period. Each reported figure is rounded half-up once; totals add rounded parts. */
export function computePay(input: PayInput): PayResult {
  const pay = validatePayInput(input);

  const totals = serviceTotals(pay.serviceLines, pay.productCharge);
  const serviceRevenue = moneyOf(totals.revenue);
  // A correction may take the charge back down, never below nothing.
  const charge = totals.charge.plus(sum(pay.chargeAdjustments));
  const productCharge = moneyOf(charge.lt(0) ? new Big(0) : charge);
  const commissionableRevenue = serviceRevenue.minus(productCharge);
  const tiers = tierCommission(commissionableRevenue, pay.tiers, pay.tierMode);
  const serviceCommission = tiers.total;
  const retailCommission = moneyOf(sum(pay.retailAmounts).times(pay.retailRate));
  // Tips pass through whole: never commissionable, never in the regular rate (29 CFR 531.60).
  const tips = moneyOf(sum(pay.tipAmounts));
  const hours = pay.hours.map((entry) => entry.hours);
  const hourlyPay = moneyOf(sum(hours).times(pay.hourlyRate));

  // The commission allocated to workweeks is the commission as paid, i.e. the rounded figures.
  const weeks = computeWorkweeks(
    groupHoursByWeek(pay.hours, pay.wageRules.workweekStartsOn),
    serviceCommission.plus(retailCommission),
    pay.hourlyRate,
    pay.wageRules,
  );
  const grossPay = sum([serviceCommission, retailCommission, hourlyPay, tips, weeks.minimumWageTopUp, weeks.overtimePremium]);

  return {
    serviceRevenue: moneyText(serviceRevenue),
    productCharge: moneyText(productCharge),
    commissionableRevenue: moneyText(commissionableRevenue),
    tierBreakdown: tiers.rows,
    serviceCommission: moneyText(serviceCommission),
    retailCommission: moneyText(retailCommission),
    hourlyPay: moneyText(hourlyPay),
    tips: moneyText(tips),
    workweeks: weeks.rows,
    minimumWageTopUp: moneyText(weeks.minimumWageTopUp),
    overtimePremium: moneyText(weeks.overtimePremium),
    grossPay: moneyText(grossPay),
  };
}
