import { moneyOf, moneyText, parseDecimal, sum } from '../money.js';

export type TicketTotalsInput = {
  serviceLines: { price: string }[];
  retailLines: { amount: string; tax: string }[];
  tips: { amount: string }[];
  /** Only settled payments count; refunds carry negative amounts. */
  payments: { amount: string; status: 'pending' | 'succeeded' | 'failed' }[];
};

export type TicketTotals = {
  services: string;
  retail: string;
  tax: string;
  tips: string;
  /** services + retail + tax + tips: what the client owes. */
  total: string;
  paid: string;
  /** total − paid; negative when more was paid than owed. */
  due: string;
};

/** A ticket's figures; every part is already a cent amount, so totals are exact sums of what is shown. */
export function ticketTotals(input: TicketTotalsInput): TicketTotals {
  const money = (values: string[], field: string) => moneyOf(sum(values.map((value, i) => parseDecimal(value, `${field}[${i}]`))));
  const services = money(input.serviceLines.map((l) => l.price), 'serviceLines');
  const retail = money(input.retailLines.map((l) => l.amount), 'retailLines');
  const tax = money(input.retailLines.map((l) => l.tax), 'retailLines');
  const tips = money(input.tips.map((t) => t.amount), 'tips');
  const paid = money(input.payments.filter((p) => p.status === 'succeeded').map((p) => p.amount), 'payments');
  const total = services.plus(retail).plus(tax).plus(tips);
  return {
    services: moneyText(services),
    retail: moneyText(retail),
    tax: moneyText(tax),
    tips: moneyText(tips),
    total: moneyText(total),
    paid: moneyText(paid),
    due: moneyText(total.minus(paid)),
  };
}

/** Cash handed back when the client tenders more than the payment. */
export function cashChange(tendered: string, amount: string): string {
  const change = parseDecimal(tendered, 'tendered').minus(parseDecimal(amount, 'amount'));
  return moneyText(change);
}
