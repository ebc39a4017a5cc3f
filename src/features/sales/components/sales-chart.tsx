import { Bar, CartesianGrid, ComposedChart, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { SalesGranularity } from '@shared/contracts/sales';
import { formatMinor, formatUnits } from './sales-format';

type Point = { start: string; units: number; revenueMinor: number };
type Props = { series: Point[]; granularity: SalesGranularity; currency: string | null; label: string };

// Colours from the studio palette (styles.css): tide for units, ochre for revenue.
const TIDE = '#1d6f6a';
const OCHRE = '#c7891f';
const INK_SOFT = '#4a555b';
const SAND = '#e7dfd0';

const bucketLabel = (start: string, granularity: SalesGranularity) => {
  const d = new Date(`${start}T00:00:00Z`);
  const opts: Intl.DateTimeFormatOptions = granularity === 'month' ? { month: 'short', year: '2-digit', timeZone: 'UTC' } : { day: 'numeric', month: 'short', timeZone: 'UTC' };
  return new Intl.DateTimeFormat(undefined, opts).format(d);
};

const granularityWords: Record<SalesGranularity, string> = { day: 'per day', week: 'per week (from Monday)', month: 'per month' };

/** Units as bars and revenue as a line over the period; a table below carries the same numbers for screen readers. */
export function SalesChart({ series, granularity, currency, label }: Props) {
  const data = series.map((p) => ({ ...p, revenue: p.revenueMinor }));
  const total = series.reduce((s, p) => s + p.units, 0);
  return (
    <figure>
      <figcaption className="mb-2 text-sm text-ink-soft">
        {label}, {granularityWords[granularity]}: units sold (bars){currency ? ` and revenue in ${currency} (line)` : ''}.
      </figcaption>
      <div className="h-64 w-full" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={data} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid stroke={SAND} vertical={false} />
            <XAxis dataKey="start" tickFormatter={(s: string) => bucketLabel(s, granularity)} stroke={INK_SOFT} fontSize={12} minTickGap={16} />
            <YAxis yAxisId="units" stroke={INK_SOFT} fontSize={12} allowDecimals={false} width={40} />
            {currency && <YAxis yAxisId="revenue" orientation="right" stroke={INK_SOFT} fontSize={12} width={64} tickFormatter={(v: number) => formatMinor(v, currency)} />}
            <Tooltip
              labelFormatter={(s) => bucketLabel(String(s), granularity)}
              formatter={(value, name) => (name === 'revenue' ? [formatMinor(Number(value), currency), 'Revenue'] : [formatUnits(Number(value)), 'Units'])}
            />
            <Bar yAxisId="units" dataKey="units" fill={TIDE} radius={[2, 2, 0, 0]} isAnimationActive={false} />
            {currency && <Line yAxisId="revenue" dataKey="revenue" stroke={OCHRE} strokeWidth={2} dot={false} isAnimationActive={false} />}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <details className="mt-2 text-sm">
        <summary className="cursor-pointer text-tide-deep">The numbers behind the chart ({formatUnits(total)} units)</summary>
        <table className="mt-2 w-full text-left tabular-nums">
          <thead>
            <tr className="text-ink-soft">
              <th scope="col" className="pr-4 font-semibold">From</th>
              <th scope="col" className="pr-4 font-semibold">Units</th>
              {currency && <th scope="col" className="font-semibold">Revenue</th>}
            </tr>
          </thead>
          <tbody>
            {series.filter((p) => p.units !== 0 || p.revenueMinor !== 0).map((p) => (
              <tr key={p.start} className="border-t border-sand">
                <td className="pr-4">{bucketLabel(p.start, granularity)}</td>
                <td className="pr-4">{formatUnits(p.units)}</td>
                {currency && <td>{formatMinor(p.revenueMinor, currency)}</td>}
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </figure>
  );
}
