import { H2, HTMLTable } from '@blueprintjs/core';
import { parseDecimal } from '@tressury/domain';
import { useId } from 'react';
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { EarningsDay } from '../api/earnings-queries';
import { dayText, isPositive, moneyText, shortDayText } from './earnings-format';

const axisTick = { fill: 'var(--tr-ink-muted)', fontSize: 12 };
const wholeNumber = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 });

/** In words, what the bars show: the same facts for a screen reader and for anyone who would rather read. */
function summaryOf(days: EarningsDay[], money: (value: string) => string): string {
  const worked = days.filter((day) => isPositive(day.serviceRevenue));
  if (worked.length === 0) return `No service revenue on the ${days.length} closed ${days.length === 1 ? 'day' : 'days'} so far.`;
  const best = worked.reduce((top, day) => (parseDecimal(day.serviceRevenue, 'day').gt(parseDecimal(top.serviceRevenue, 'top')) ? day : top));
  return `Service revenue on ${worked.length} of ${days.length} days so far; the best was ${dayText(best.date)} with ${money(best.serviceRevenue)}. The table below gives every day's figures.`;
}

/** Service revenue per business date as bars, and the day-by-day figures as a table under it. */
export function DailyChart({ days, currency }: { days: EarningsDay[]; currency: string }) {
  const id = useId();
  const money = (value: string) => moneyText(value, currency);
  // Plot positions only: every figure a person reads comes from the API's decimal strings.
  const data = days.map((day) => ({ date: day.date, value: Number(day.serviceRevenue), label: money(day.serviceRevenue) }));
  return (
    <section className="tr-panel" aria-labelledby={`${id}-title`}>
      <H2 id={`${id}-title`} className="tr-panel-title">
        Day by day
      </H2>
      <figure className="tr-earnings-chart" aria-label="Service revenue per day" aria-describedby={`${id}-summary`}>
        <ResponsiveContainer width="100%" height={240}>
          <BarChart data={data} margin={{ top: 8, right: 16, bottom: 24, left: 16 }}>
            <CartesianGrid stroke="var(--tr-line)" strokeDasharray="3 3" vertical={false} />
            <XAxis
              dataKey="date"
              tick={axisTick}
              tickFormatter={shortDayText}
              label={{ value: 'Business date', position: 'insideBottom', offset: -16, fill: 'var(--tr-ink-muted)' }}
            />
            <YAxis
              tick={axisTick}
              width={72}
              tickFormatter={(value: number) => wholeNumber.format(value)}
              label={{ value: `Service revenue (${currency})`, angle: -90, position: 'insideLeft', offset: -4, fill: 'var(--tr-ink-muted)', style: { textAnchor: 'middle' } }}
            />
            <Tooltip
              cursor={{ fill: 'var(--tr-copper-soft)' }}
              contentStyle={{ background: 'var(--tr-surface-raised)', border: '1px solid var(--tr-line)', color: 'var(--tr-ink)' }}
              labelFormatter={(date) => dayText(String(date))}
              formatter={(_value, _name, item) => [item.payload.label, 'Service revenue']}
            />
            <Bar dataKey="value" name="Service revenue" fill="var(--tr-chart-1, var(--tr-spruce))" maxBarSize={40} isAnimationActive={false} />
          </BarChart>
        </ResponsiveContainer>
        <figcaption id={`${id}-summary`} className="tr-muted tr-earnings-explain">
          {summaryOf(days, money)}
        </figcaption>
      </figure>
      <div className="tr-table-frame">
        <HTMLTable compact className="tr-table" aria-label="Figures per day">
          <thead>
            <tr>
              <th scope="col">Business date</th>
              <th scope="col" className="tr-figure">
                Service revenue
              </th>
              <th scope="col" className="tr-figure">
                Product charge
              </th>
              <th scope="col" className="tr-figure">
                Retail sales
              </th>
              <th scope="col" className="tr-figure">
                Tips
              </th>
            </tr>
          </thead>
          <tbody>
            {days.map((day) => (
              <tr key={day.date}>
                <th scope="row" className="tr-row-head">
                  {dayText(day.date)}
                </th>
                <td className="tr-figure">{money(day.serviceRevenue)}</td>
                <td className="tr-figure">{money(day.productCharge)}</td>
                <td className="tr-figure">{money(day.retailRevenue)}</td>
                <td className="tr-figure">{money(day.tips)}</td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
    </section>
  );
}
