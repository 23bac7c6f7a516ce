import { addDays, eachDayOfInterval, format, parseISO, startOfWeek } from 'date-fns';
import Decimal from 'decimal.js';
import { describe, expect, it } from 'vitest';
import type { BranchTrend } from '../api/compare-queries';
import { revenueTrend, summariseLines } from './chart-data';

// Sums are recomputed with decimal.js and week boundaries with date-fns: independent libraries, not our code.
const ymd = (date: Date) => format(date, 'yyyy-MM-dd');

function dailyTrend(from: string, to: string): BranchTrend {
  const dates = eachDayOfInterval({ start: parseISO(from), end: parseISO(to) }).map(ymd);
  // Amounts with cents that a float would mangle when added up: 0.10 and 0.20 and so on.
  const points = dates.map((date, i) => ({
    date,
    serviceRevenue: `${100 + (i % 7)}.${String((i * 7) % 100).padStart(2, '0')}`,
    retailRevenue: `0.${String((i * 3) % 100).padStart(2, '0')}`,
    tickets: 3,
    averageTicket: null,
    colourCostShare: null,
  }));
  return { from, to, series: [{ branchId: 'b1', branchName: 'Elmstead', points }] };
}

describe('revenue trend', () => {
  it('keeps one point a day up to 45 days', () => {
    const trend = revenueTrend(dailyTrend('2026-10-01', '2026-11-14'), { from: '2026-10-01', to: '2026-11-14' }, 0);
    expect(trend.step).toBe('day');
    expect(trend.buckets).toHaveLength(45);
    expect(trend.lines[0]?.revenue[0]).toBe(new Decimal('100.00').plus('0.00').toFixed(2));
  });

  it.each([0, 1, 3])('adds longer ranges up week by week (weeks beginning on day %i), marking the cut weeks', (weekStartsOn) => {
    const range = { from: '2026-09-03', to: '2026-12-01' };
    const daily = dailyTrend(range.from, range.to);
    const trend = revenueTrend(daily, range, weekStartsOn);
    expect(trend.step).toBe('week');

    const expected = new Map<string, Decimal>();
    const covered = new Map<string, number>();
    for (const point of daily.series[0]?.points ?? []) {
      const week = ymd(startOfWeek(parseISO(point.date), { weekStartsOn: weekStartsOn as 0 | 1 | 3 }));
      expected.set(week, (expected.get(week) ?? new Decimal(0)).plus(point.serviceRevenue).plus(point.retailRevenue));
      covered.set(week, (covered.get(week) ?? 0) + 1);
    }
    expect(trend.buckets).toEqual([...expected.keys()]);
    expect(trend.lines[0]?.revenue).toEqual([...expected.values()].map((sum) => sum.toFixed(2)));
    expect(trend.daysCovered).toEqual([...covered.values()]);
    // Each week starts seven days after the one before.
    trend.buckets.slice(1).forEach((bucket, i) => expect(bucket).toBe(ymd(addDays(parseISO(trend.buckets[i] as string), 7))));
  });

  it('sums each line and finds its best bucket', () => {
    const range = { from: '2026-09-03', to: '2026-12-01' };
    const trend = revenueTrend(dailyTrend(range.from, range.to), range, 0);
    const [summary] = summariseLines(trend);
    const total = (trend.lines[0]?.revenue ?? []).reduce((sum, amount) => sum.plus(amount), new Decimal(0));
    expect(summary?.total).toBe(total.toFixed(2));
    const best = Decimal.max(...(trend.lines[0]?.revenue ?? []));
    expect(summary?.best?.revenue).toBe(best.toFixed(2));
  });
});
