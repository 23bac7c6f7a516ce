import { sumMoney } from '@tressury/domain';
import type { BranchTrend } from '../api/compare-queries';
import { compareDecimals } from './figure-format';
import { addDays, type DateRange, daysIn, weekStart } from './date-ranges';

/** Longer ranges than this are drawn week by week, or the lines turn to noise. */
export const DAILY_LIMIT_DAYS = 45;

export type TrendLine = { branchId: string; branchName: string; revenue: string[] };
/**
 * Revenue (services plus retail) per branch per bucket; a bucket is a day or a week named by its first day.
 * `daysCovered` says how many of a bucket's days the range holds: a week cut by the range's ends has fewer than 7.
 */
export type RevenueTrend = { step: 'day' | 'week'; buckets: string[]; daysCovered: number[]; lines: TrendLine[] };

export function revenueTrend(trend: BranchTrend, range: DateRange, weekStartsOn: number): RevenueTrend {
  const step = daysIn(range) > DAILY_LIMIT_DAYS ? 'week' : 'day';
  const bucketOf = (date: string) => (step === 'week' ? weekStart(date, weekStartsOn) : date);
  const buckets = [...new Set(trend.series.flatMap((s) => s.points.map((p) => bucketOf(p.date))))].sort();
  const lines = trend.series.map((series) => {
    const amounts = new Map<string, string[]>();
    for (const point of series.points) {
      const bucket = bucketOf(point.date);
      amounts.set(bucket, [...(amounts.get(bucket) ?? []), point.serviceRevenue, point.retailRevenue]);
    }
    return { branchId: series.branchId, branchName: series.branchName, revenue: buckets.map((bucket) => sumMoney(amounts.get(bucket) ?? [])) };
  });
  const daysCovered = buckets.map((bucket) => {
    if (step === 'day') return 1;
    const last = addDays(bucket, 6);
    return daysIn({ from: bucket < range.from ? range.from : bucket, to: last > range.to ? range.to : last });
  });
  return { step, buckets, daysCovered, lines };
}

export type LineSummary = { branchName: string; total: string; best: { bucket: string; revenue: string } | null };

/** Each line in words: its total and its best day or week. */
export function summariseLines(trend: RevenueTrend): LineSummary[] {
  return trend.lines.map((line) => {
    let best: LineSummary['best'] = null;
    line.revenue.forEach((revenue, i) => {
      if (compareDecimals(revenue, '0') > 0 && (best === null || compareDecimals(revenue, best.revenue) > 0)) best = { bucket: trend.buckets[i] as string, revenue };
    });
    return { branchName: line.branchName, total: sumMoney(line.revenue), best };
  });
}
