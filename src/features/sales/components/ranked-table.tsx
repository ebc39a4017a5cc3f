import { useState, type ReactNode } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { RadioGroup } from '../../../components/ui/radio-group';
import { formatMinor, formatUnits } from './sales-format';

export type RankedRow = { id: string; name: ReactNode; detail?: ReactNode; units: number; revenueMinor: number; share?: number };

type Props = { rows: RankedRow[]; currency: string | null; noun: string; caption: string; empty: ReactNode };

const percent = new Intl.NumberFormat(undefined, { style: 'percent', maximumFractionDigits: 1 });

/** A ranking the reader can order by units or by revenue (in the shown currency). */
export function RankedTable({ rows, currency, noun, caption, empty }: Props) {
  const [by, setBy] = useState<'units' | 'revenue'>('units');
  const [showAll, setShowAll] = useState(false);
  if (rows.length === 0) return <EmptyState title={`No ${noun} sold in this period`}>{empty}</EmptyState>;
  const sorted = [...rows].sort((a, b) => (by === 'units' ? b.units - a.units || b.revenueMinor - a.revenueMinor : b.revenueMinor - a.revenueMinor || b.units - a.units));
  const shown = showAll ? sorted : sorted.slice(0, 10);
  const hasShare = rows.some((r) => r.share !== undefined);
  return (
    <div className="flex flex-col gap-3">
      <RadioGroup inline legend="Rank by" name={`rank-${noun}`} value={by} onChange={setBy} options={[{ value: 'units', label: 'Units' }, { value: 'revenue', label: currency ? `Revenue (${currency})` : 'Revenue' }]} />
      <div className="overflow-x-auto">
        <table className="w-full text-left">
          <caption className="sr-only">{caption}</caption>
          <thead>
            <tr className="text-ink-soft">
              <th scope="col" className="pb-2 pr-4 font-semibold">#</th>
              <th scope="col" className="pb-2 pr-4 font-semibold">Name</th>
              <th scope="col" className="pb-2 pr-4 text-right font-semibold">Units</th>
              <th scope="col" className="pb-2 pr-4 text-right font-semibold">Revenue</th>
              {hasShare && <th scope="col" className="pb-2 text-right font-semibold">Share of units</th>}
            </tr>
          </thead>
          <tbody className="tabular-nums">
            {shown.map((row, i) => (
              <tr key={row.id} className="border-t border-sand align-top">
                <td className="py-2 pr-4 text-ink-soft">{i + 1}</td>
                <td className="py-2 pr-4">
                  <div className="break-words">{row.name}</div>
                  {row.detail && <div className="text-sm text-ink-soft">{row.detail}</div>}
                </td>
                <td className="py-2 pr-4 text-right">{formatUnits(row.units)}</td>
                <td className="py-2 pr-4 text-right">{formatMinor(row.revenueMinor, currency)}</td>
                {hasShare && <td className="py-2 text-right">{row.share === undefined ? '–' : percent.format(row.share)}</td>}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {rows.length > 10 && (
        <button type="button" className="self-start text-tide-deep underline" onClick={() => setShowAll((v) => !v)}>
          {showAll ? 'Show the top 10' : `Show all ${rows.length} ${noun}`}
        </button>
      )}
    </div>
  );
}
