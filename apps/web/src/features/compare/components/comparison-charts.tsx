import { H3 } from '@blueprintjs/core';
import { type ReactNode, useId } from 'react';
import {
  Bar,
  BarChart,
  CartesianGrid,
  LabelList,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { BranchFigures } from '../api/compare-queries';
import { type RevenueTrend, summariseLines } from './chart-data';
import { compareDecimals, groupedText, percentText, shortDateText } from './figure-format';
import './compare.css';

// Our palette's chart tokens (tokens.css), with a marker shape and a dash per series so colour is never the only cue.
const seriesColours = ['var(--tr-chart-1)', 'var(--tr-chart-2)', 'var(--tr-chart-3)', 'var(--tr-chart-4)', 'var(--tr-chart-5)'];
const seriesMarkers = ['circle', 'square', 'triangle', 'diamond', 'cross', 'star'] as const;
const seriesDashes = [undefined, '6 3', '2 3', '8 3 2 3'];

const axisTick = { fill: 'var(--tr-ink-muted)', fontSize: 12 };
const wholeNumber = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });
// Plot positions only: every figure a person reads comes from the API's decimal strings.
const plotted = (text: string | null): number | null => (text === null ? null : Number(text));

function ChartFigure({ title, summary, children }: { title: string; summary: ReactNode; children: ReactNode }) {
  const id = useId();
  return (
    <figure className="tr-panel tr-chart" aria-labelledby={`${id}-title`} aria-describedby={`${id}-summary`}>
      <H3 id={`${id}-title`} className="tr-panel-title">
        {title}
      </H3>
      <div className="tr-chart-plot">{children}</div>
      <figcaption id={`${id}-summary`} className="tr-chart-summary">
        {summary}
      </figcaption>
    </figure>
  );
}

/** Revenue (services and retail) per branch over the range, one line per branch. */
export function RevenueTrendChart({ trend, place }: { trend: RevenueTrend; place?: string }) {
  const unit = trend.step === 'week' ? 'week' : 'day';
  const data = trend.buckets.map((bucket, i) => {
    const point: Record<string, string | number | null> = { bucket };
    for (const line of trend.lines) {
      point[line.branchId] = plotted(line.revenue[i] ?? null);
      point[`${line.branchId}:text`] = line.revenue[i] ?? null;
    }
    return point;
  });
  const summaries = summariseLines(trend);
  const bucketText = (bucket: string) => (trend.step === 'week' ? `week of ${shortDateText(bucket)}` : shortDateText(bucket));
  // A week the range cuts short is marked, so its lower total is not read as a bad week.
  const partial = new Map(trend.buckets.flatMap((bucket, i) => (trend.step === 'week' && (trend.daysCovered[i] ?? 7) < 7 ? [[bucket, trend.daysCovered[i] ?? 0]] : [])));
  const partialText = [...partial].map(([bucket, days]) => `${shortDateText(bucket, false)} (${days} of 7 days)`).join(', ');

  return (
    <ChartFigure
      title={`Revenue per ${unit}${place ? ` at ${place}` : ''}`}
      summary={
        trend.buckets.length === 0 ? (
          'No closed tickets in these dates.'
        ) : (
          <>
            Services and retail together, per {unit}
            {trend.step === 'week' ? ', each week named by its first day' : ''}.{' '}
            {partial.size > 0 ? `Weeks marked * hold only part of the range: ${partialText}. ` : ''}
            {summaries
              .map((s) => `${s.branchName}: ${groupedText(s.total)} in all${s.best ? `, best ${unit} ${bucketText(s.best.bucket)} with ${groupedText(s.best.revenue)}` : ''}.`)
              .join(' ')}
          </>
        )
      }
    >
      <ResponsiveContainer width="100%" height={300}>
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 24, left: 16 }}>
          <CartesianGrid stroke="var(--tr-line)" strokeDasharray="3 3" />
          <XAxis
            dataKey="bucket"
            tick={axisTick}
            tickFormatter={(bucket: string) => `${shortDateText(bucket, false)}${partial.has(bucket) ? '*' : ''}`}
            label={{ value: trend.step === 'week' ? 'Week beginning' : 'Business date', position: 'insideBottom', offset: -16, fill: 'var(--tr-ink-muted)' }}
          />
          <YAxis
            tick={axisTick}
            width={72}
            tickFormatter={(value: number) => wholeNumber.format(value)}
            label={{ value: `Revenue per ${unit}`, angle: -90, position: 'insideLeft', offset: -4, fill: 'var(--tr-ink-muted)', style: { textAnchor: 'middle' } }}
          />
          <Tooltip
            contentStyle={{ background: 'var(--tr-surface-raised)', border: '1px solid var(--tr-line)', color: 'var(--tr-ink)' }}
            labelFormatter={(bucket) => `${bucketText(String(bucket))}${partial.has(String(bucket)) ? ` (only ${partial.get(String(bucket))} of its 7 days)` : ''}`}
            formatter={(_value, name, item) => [groupedText(String(item.payload[`${String(item.dataKey)}:text`] ?? '')), name]}
          />
          <Legend verticalAlign="top" height={32} wrapperStyle={{ color: 'var(--tr-ink)' }} />
          {trend.lines.map((line, i) => {
            const colour = seriesColours[i % seriesColours.length];
            const marker = seriesMarkers[i % seriesMarkers.length];
            return (
              <Line
                key={line.branchId}
                type="monotone"
                dataKey={line.branchId}
                name={line.branchName}
                stroke={colour}
                strokeWidth={2}
                strokeDasharray={seriesDashes[i % seriesDashes.length]}
                dot={{ symbol: marker, r: 4, fill: colour, stroke: colour }}
                activeDot={{ r: 6 }}
                legendType={marker}
                isAnimationActive={false}
              />
            );
          })}
        </LineChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

type BarFigure = 'colourCostShare' | 'averageTicket';

const barCharts: Record<BarFigure, { title: string; axis: string; text: (value: string) => string; missing: string }> = {
  colourCostShare: {
    title: 'Colour cost share',
    axis: 'Colour product cost as % of colour revenue',
    text: percentText,
    missing: 'no colour service revenue',
  },
  averageTicket: { title: 'Average ticket', axis: 'Average ticket', text: groupedText, missing: 'no tickets' },
};

/** One bar per branch for a figure of the comparison, with the all-branches figure as a reference line. */
export function BranchBarChart({ figure, rows, totals }: { figure: BarFigure; rows: BranchFigures[]; totals: BranchFigures }) {
  const chart = barCharts[figure];
  const scale = figure === 'colourCostShare' ? 100 : 1;
  const data = rows
    .filter((row) => row[figure] !== null)
    .map((row) => ({ branch: row.branchName, value: (plotted(row[figure]) ?? 0) * scale, label: chart.text(row[figure] as string) }));
  const without = rows.filter((row) => row[figure] === null).map((row) => row.branchName);
  const overall = totals[figure];
  const ordered = [...rows].filter((row) => row[figure] !== null).sort((a, b) => compareDecimals(b[figure] as string, a[figure] as string));
  const highest = ordered[0];
  const lowest = ordered[ordered.length - 1];

  const summary =
    data.length === 0
      ? `No branch had ${chart.missing} to work this out from.`
      : [
          `${rows
            .filter((row) => row[figure] !== null)
            .map((row) => `${row.branchName} ${chart.text(row[figure] as string)}`)
            .join(', ')}.`,
          highest && lowest && highest !== lowest ? `Highest ${highest.branchName}, lowest ${lowest.branchName}.` : '',
          overall !== null ? `All branches together: ${chart.text(overall)}.` : '',
          without.length > 0 ? `Not shown: ${without.join(', ')} (${chart.missing}).` : '',
        ]
          .filter(Boolean)
          .join(' ');

  return (
    <ChartFigure title={chart.title} summary={summary}>
      <ResponsiveContainer width="100%" height={Math.max(160, 56 + data.length * 44)}>
        <BarChart data={data} layout="vertical" margin={{ top: 28, right: 72, bottom: 24, left: 8 }}>
          <CartesianGrid stroke="var(--tr-line)" strokeDasharray="3 3" horizontal={false} />
          <XAxis
            type="number"
            tick={axisTick}
            tickFormatter={(value: number) => (figure === 'colourCostShare' ? `${value} %` : wholeNumber.format(value))}
            label={{ value: chart.axis, position: 'insideBottom', offset: -16, fill: 'var(--tr-ink-muted)' }}
          />
          <YAxis type="category" dataKey="branch" tick={{ ...axisTick, fill: 'var(--tr-ink)' }} width={120} />
          <Tooltip
            cursor={{ fill: 'var(--tr-copper-soft)' }}
            contentStyle={{ background: 'var(--tr-surface-raised)', border: '1px solid var(--tr-line)', color: 'var(--tr-ink)' }}
            formatter={(_value, _name, item) => [item.payload.label, chart.title]}
          />
          {overall !== null && (
            <ReferenceLine
              x={(plotted(overall) ?? 0) * scale}
              stroke="var(--tr-copper)"
              strokeDasharray="5 3"
              label={{ value: `All branches ${chart.text(overall)}`, position: 'top', fill: 'var(--tr-ink)', fontSize: 12 }}
            />
          )}
          <Bar dataKey="value" name={chart.title} fill="var(--tr-chart-1)" barSize={22} isAnimationActive={false}>
            <LabelList dataKey="label" position="right" fill="var(--tr-ink)" fontSize={12} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
