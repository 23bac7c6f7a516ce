import Big from 'big.js';
import { invalid, readDecimal } from '../fields.js';
import { moneyOf, moneyText, sum } from '../money.js';
import { computePay } from './compute-pay.js';
import type { PayInput, PayResult } from './types.js';
import { validatePayInput } from './validate-pay-input.js';

/** Invented figures for one pay period, to show what a plan's terms would pay. */
export type CommissionSample = {
  /** All service revenue in the period, colour services included. */
  serviceRevenue: string;
  /** The part of it that came from colour services. */
  colourRevenue: string;
  /** How many colour services made up that colour revenue (a fixed charge applies to each). */
  colourServices: number;
  /** Colour product used on those services, at cost. */
  colourProductCost: string;
  retailSales: string;
};

export type CommissionPreview = Pick<
  PayResult,
  'serviceRevenue' | 'productCharge' | 'commissionableRevenue' | 'tierBreakdown' | 'serviceCommission' | 'retailCommission'
> & {
  /** Service plus retail commission: the sum of the two rounded figures. */
  totalCommission: string;
};

const MAX_COLOUR_SERVICES = 1000;
const SAMPLE_DATE = '2000-01-03';
const NO_WAGE_RULES: PayInput['wageRules'] = { minimumWage: '0', overtimeAfterHours: '40', overtimeMultiplier: '1', workweekStartsOn: 0, commissionExemption: false };

/** `total` to the cent split into `count` parts that differ by at most a cent and add up to it exactly. */
function splitCents(total: Big, count: number): Big[] {
  const cents = moneyOf(total).times(100);
  const each = cents.div(count).round(0, Big.roundDown);
  const left = cents.minus(each.times(count)).toNumber();
  return Array.from({ length: count }, (_, i) => (i < left ? each.plus(1) : each).div(100));
}

/**
 * The commission a plan's terms pay on a sample period, computed by computePay itself so the preview and a
 * payroll run can never disagree: the colour revenue and product cost are spread evenly over the colour
 * services, the rest of the service revenue is one service without colour. Hours are left out.
 */
export function commissionPreview(plan: PayInput['plan'], sample: CommissionSample): CommissionPreview {
  // The terms first, so a mistake in them is reported before one in the sample.
  validatePayInput({ plan, serviceLines: [], retailLines: [], tips: [], hours: [], wageRules: NO_WAGE_RULES });

  const serviceRevenue = readDecimal(sample.serviceRevenue, 'sample.serviceRevenue', { min: '0' });
  const colourRevenue = readDecimal(sample.colourRevenue, 'sample.colourRevenue', { min: '0', max: serviceRevenue });
  const productCost = readDecimal(sample.colourProductCost, 'sample.colourProductCost', { min: '0' });
  const retailSales = readDecimal(sample.retailSales, 'sample.retailSales', { min: '0' });
  const count = sample.colourServices;
  if (!Number.isInteger(count) || count < 0 || count > MAX_COLOUR_SERVICES) {
    throw invalid('sample.colourServices', `sample.colourServices must be a whole number from 0 to ${MAX_COLOUR_SERVICES}`);
  }
  if (count === 0 && (colourRevenue.gt(0) || productCost.gt(0))) {
    throw invalid('sample.colourServices', 'sample.colourServices must be at least 1 when there is colour revenue or colour product');
  }

  const prices = count > 0 ? splitCents(colourRevenue, count) : [];
  const costs = count > 0 ? splitCents(productCost, count) : [];
  const serviceLines: PayInput['serviceLines'] = prices.map((price, i) => ({
    id: `colour-${i + 1}`,
    date: SAMPLE_DATE,
    price: price.toFixed(2),
    isColour: true,
    productCost: (costs[i] ?? new Big(0)).toFixed(2),
  }));
  const otherRevenue = moneyOf(serviceRevenue).minus(sum(prices));
  if (otherRevenue.gt(0)) serviceLines.push({ id: 'other', date: SAMPLE_DATE, price: otherRevenue.toFixed(2), isColour: false, productCost: '0' });

  const result = computePay({
    plan,
    serviceLines,
    retailLines: retailSales.gt(0) ? [{ id: 'retail', date: SAMPLE_DATE, amount: moneyText(retailSales) }] : [],
    tips: [],
    hours: [],
    wageRules: NO_WAGE_RULES,
  });
  return {
    serviceRevenue: result.serviceRevenue,
    productCharge: result.productCharge,
    commissionableRevenue: result.commissionableRevenue,
    tierBreakdown: result.tierBreakdown,
    serviceCommission: result.serviceCommission,
    retailCommission: result.retailCommission,
    totalCommission: moneyText(sum([new Big(result.serviceCommission), new Big(result.retailCommission)])),
  };
}
