import Big from 'big.js';
import { moneyText, parseDecimal, roundQuotient } from '../money.js';

/** What a branch (or a day, or a stylist) adds up to over a range: exact sums, as the read models hold them. */
export type FigureSums = {
  serviceRevenue: string;
  retailRevenue: string;
  tickets: number;
  colourServiceRevenue: string;
  colourProductCost: string;
  /** Timesheet hours, and the service revenue of the staff-days those hours belong to. */
  hours: string;
  revenueWithHours: string;
  /** Distinct clients seen, and those of them who came back within the rebooking window. */
  clients: number;
  rebookedClients: number;
  /** null when no approved payroll run covers the range. */
  commissionCost: string | null;
  /** The service revenue of the dates the counted payroll runs cover. */
  commissionBase: string | null;
};

export type DerivedFigures = {
  averageTicket: string | null;
  colourCostShare: string | null;
  retailToServiceRatio: string | null;
  revenuePerStylistHour: string | null;
  rebookingRate: string | null;
  commissionCostShare: string | null;
};

/** Shares and ratios are fractions to four places ("0.1834"), rounded half-up once. */
const SHARE_PLACES = 4;

/** part ÷ base as a fraction; null when the base is zero or below, where a share means nothing. */
export function shareOf(part: string, base: string): string | null {
  const denominator = parseDecimal(base, 'base');
  if (denominator.lte(0)) return null;
  return roundQuotient(parseDecimal(part, 'part'), denominator, SHARE_PLACES).toFixed(SHARE_PLACES);
}

/** amount ÷ count to the cent, half-up; null when there is nothing to divide by. */
export function amountPer(amount: string, count: string): string | null {
  const denominator = parseDecimal(count, 'count');
  if (denominator.lte(0)) return null;
  return moneyText(roundQuotient(parseDecimal(amount, 'amount'), denominator, 2));
}

/** An exact sum of decimal quantities such as hours (money is summed with sumMoney), to `places` decimals. */
export function sumQuantities(values: string[], places: number): string {
  return values.reduce((total, value, i) => total.plus(parseDecimal(value, `values[${i}]`)), new Big(0)).toFixed(places);
}

/** The ratios an owner compares branches by, each computed from the range's sums (never averaged from days). */
export function deriveFigures(sums: FigureSums): DerivedFigures {
  const sales = parseDecimal(sums.serviceRevenue, 'serviceRevenue').plus(parseDecimal(sums.retailRevenue, 'retailRevenue'));
  return {
    averageTicket: amountPer(sales.toFixed(2), String(sums.tickets)),
    colourCostShare: shareOf(sums.colourProductCost, sums.colourServiceRevenue),
    retailToServiceRatio: shareOf(sums.retailRevenue, sums.serviceRevenue),
    revenuePerStylistHour: amountPer(sums.revenueWithHours, sums.hours),
    rebookingRate: shareOf(String(sums.rebookedClients), String(sums.clients)),
    commissionCostShare: sums.commissionCost === null || sums.commissionBase === null ? null : shareOf(sums.commissionCost, sums.commissionBase),
  };
}

export type FeeStatement = { royaltyAmount: string; marketingFundAmount: string; totalFees: string };

/**
 * A branch's franchise fees for a month: each fee is gross sales × its rate rounded half-up to the cent
 * once, and the total is the sum of the two rounded fees (common practice; the franchise agreement governs).
 */
export function feeStatement(input: { grossSales: string; royaltyRate: string; marketingFundRate: string }): FeeStatement {
  const gross = parseDecimal(input.grossSales, 'grossSales');
  const royalty = new Big(moneyText(gross.times(parseDecimal(input.royaltyRate, 'royaltyRate'))));
  const marketing = new Big(moneyText(gross.times(parseDecimal(input.marketingFundRate, 'marketingFundRate'))));
  return { royaltyAmount: royalty.toFixed(2), marketingFundAmount: marketing.toFixed(2), totalFees: royalty.plus(marketing).toFixed(2) };
}
