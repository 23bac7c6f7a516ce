import Big from 'big.js';
import { moneyOf, moneyText, plainText, roundQuotient, sum } from '../money.js';
import { formatBusinessDate, workweekStart } from './business-date.js';
import type { HoursEntry, PayResult, WageRules } from './types.js';

export type WorkweekRow = PayResult['workweeks'][number];

/** Hours summed per workweek, earliest first; a week with no hours is no workweek. */
export function groupHoursByWeek(entries: HoursEntry[], startsOn: number): { start: number; hours: Big }[] {
  const weeks = new Map<number, Big>();
  for (const entry of entries) {
    const start = workweekStart(entry.day, startsOn);
    weeks.set(start, (weeks.get(start) ?? new Big(0)).plus(entry.hours));
  }
  return [...weeks.entries()]
    .filter(([, hours]) => hours.gt(0))
    .sort(([a], [b]) => a - b)
    .map(([start, hours]) => ({ start, hours }));
}

/**
 * Each workweek stands alone (29 CFR 778.104). The period's commission is spread over every hour worked
 * in it, an equal amount per hour (29 CFR 778.120(b)). Every figure below is kept as a numerator over
 * periodHours so that each reported figure comes from a single division, rounded once.
 */
export function computeWorkweeks(
  weeks: { start: number; hours: Big }[],
  commission: Big,
  hourlyRate: Big,
  rules: WageRules,
): { rows: WorkweekRow[]; minimumWageTopUp: Big; overtimePremium: Big } {
  const periodHours = sum(weeks.map((week) => week.hours));
  const topUps: Big[] = [];
  const premiums: Big[] = [];
  const rows = weeks.map(({ start, hours }) => {
    const commissionShare = commission.times(hours); // ÷ periodHours
    const earnings = hourlyRate.times(hours).times(periodHours).plus(commissionShare); // ÷ periodHours
    // 29 U.S.C. 206 and 29 CFR 531.35: minimum wage for every hour, after any product charge.
    const minimum = rules.minimumWage.times(hours).times(periodHours);
    const topUp = minimum.gt(earnings) ? minimum.minus(earnings) : new Big(0); // ÷ periodHours
    const paid = earnings.plus(topUp); // ÷ periodHours; regular rate = paid ÷ (periodHours × hours), 29 CFR 778.109
    const rateDenominator = periodHours.times(hours);
    const overtimeHours = hours.gt(rules.overtimeAfterHours) ? hours.minus(rules.overtimeAfterHours) : new Big(0);
    // 29 U.S.C. 207(i): regular rate above 1.5 × minimum wage and commission more than half the week's
    // earnings; the pay period stands in for the representative period (29 CFR 779.417).
    const exempt =
      rules.commissionExemption &&
      paid.gt(rules.minimumWage.times('1.5').times(rateDenominator)) &&
      commissionShare.gt(0) &&
      commissionShare.times(2).gt(earnings);
    // 29 U.S.C. 207(a)(1), 29 CFR 778.118: (multiplier − 1) × regular rate × hours over the threshold.
    const premium = exempt
      ? new Big(0)
      : roundQuotient(rules.overtimeMultiplier.minus(1).times(paid).times(overtimeHours), rateDenominator, 2);
    const roundedTopUp = roundQuotient(topUp, periodHours, 2);
    topUps.push(roundedTopUp);
    premiums.push(premium);
    return {
      start: formatBusinessDate(start),
      hours: plainText(hours),
      earnings: roundQuotient(earnings, periodHours, 2).toFixed(2),
      regularRate: roundQuotient(paid, rateDenominator, 2).toFixed(2),
      minimumWageTopUp: roundedTopUp.toFixed(2),
      overtimeHours: plainText(overtimeHours),
      overtimePremium: moneyText(premium),
      exempt,
    };
  });
  return { rows, minimumWageTopUp: moneyOf(sum(topUps)), overtimePremium: moneyOf(sum(premiums)) };
}
