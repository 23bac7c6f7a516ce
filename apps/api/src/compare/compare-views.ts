import { deriveFigures, sumMoney, sumQuantities } from '@tressury/domain';
import type { BranchRow } from '@tressury/schema';
import type { BranchSums } from './compare-figures.js';
import type { BranchFiguresView } from './dto/branch-comparison.view.js';
import type { CompareBranchView } from './dto/compare-branch.view.js';

/** Hours as entered (numeric(12,3) pads them): at least two decimals, three where a part hour needs them. */
export function hoursText(value: string): string {
  const [whole, fraction = ''] = value.split('.');
  const trimmed = fraction.replace(/0+$/, '');
  return `${whole}.${trimmed.padEnd(2, '0')}`;
}

const money = (value: string): string => sumMoney([value]);
const nullableSum = (values: (string | null)[]): string | null => {
  const present = values.filter((v): v is string => v !== null);
  return present.length === 0 ? null : sumMoney(present);
};

/** Adds branches' sums; client counts add up too, so a client seen at two branches counts at each. */
export function addSums(all: BranchSums[]): BranchSums {
  const total = (pick: (s: BranchSums) => string) => sumMoney(all.map(pick));
  const count = (pick: (s: BranchSums) => number) => all.reduce((n, s) => n + pick(s), 0);
  return {
    serviceRevenue: total((s) => s.serviceRevenue),
    colourServiceRevenue: total((s) => s.colourServiceRevenue),
    colourProductCost: total((s) => s.colourProductCost),
    retailRevenue: total((s) => s.retailRevenue),
    tips: total((s) => s.tips),
    tickets: count((s) => s.tickets),
    voids: count((s) => s.voids),
    refunds: count((s) => s.refunds),
    refundedAmount: total((s) => s.refundedAmount),
    hours: sumQuantities(
      all.map((s) => s.hours),
      3,
    ),
    revenueWithHours: total((s) => s.revenueWithHours),
    clients: count((s) => s.clients),
    newClients: count((s) => s.newClients),
    rebookedClients: count((s) => s.rebookedClients),
    commissionCost: nullableSum(all.map((s) => s.commissionCost)),
    commissionBase: nullableSum(all.map((s) => s.commissionBase)),
    productChargeRecovered: nullableSum(all.map((s) => s.productChargeRecovered)),
  };
}

export function toFiguresView(branch: { id: string; name: string } | null, branchName: string, sums: BranchSums): BranchFiguresView {
  const derived = deriveFigures(sums);
  return {
    branchId: branch?.id ?? null,
    branchName,
    serviceRevenue: money(sums.serviceRevenue),
    retailRevenue: money(sums.retailRevenue),
    tickets: sums.tickets,
    averageTicket: derived.averageTicket,
    colourServiceRevenue: money(sums.colourServiceRevenue),
    colourProductCost: money(sums.colourProductCost),
    colourCostShare: derived.colourCostShare,
    productChargeRecovered: sums.productChargeRecovered === null ? null : money(sums.productChargeRecovered),
    retailToServiceRatio: derived.retailToServiceRatio,
    stylistHours: hoursText(sums.hours),
    revenuePerStylistHour: derived.revenuePerStylistHour,
    newClients: sums.newClients,
    returningClients: sums.clients - sums.newClients,
    rebookingRate: derived.rebookingRate,
    tips: money(sums.tips),
    commissionCost: sums.commissionCost === null ? null : money(sums.commissionCost),
    commissionCostShare: derived.commissionCostShare,
    voids: sums.voids,
    refunds: sums.refunds,
    refundedAmount: money(sums.refundedAmount),
  };
}

export function toCompareBranchView(row: BranchRow): CompareBranchView {
  return { id: row.id, name: row.name, timeZone: row.timeZone, currency: row.currency };
}
