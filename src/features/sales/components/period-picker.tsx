import { useId } from 'react';
import { Select } from '../../../components/ui/select-field';

export type Period = { from: string; to: string };

const day = (d: Date) => d.toISOString().slice(0, 10);
const monthsBack = (months: number) => {
  const to = new Date();
  const from = new Date(to);
  from.setUTCMonth(from.getUTCMonth() - months);
  from.setUTCDate(from.getUTCDate() + 1);
  return { from: day(from), to: day(to) };
};

export const periodPresets = {
  '30d': { label: 'Last 30 days', period: () => ({ from: day(new Date(Date.now() - 29 * 86_400_000)), to: day(new Date()) }) },
  '3m': { label: 'Last 3 months', period: () => monthsBack(3) },
  '12m': { label: 'Last 12 months', period: () => monthsBack(12) },
  '24m': { label: 'Last 2 years', period: () => monthsBack(24) },
} as const;
export type PeriodPreset = keyof typeof periodPresets | 'custom';

type Props = { preset: PeriodPreset; period: Period; onChange: (preset: PeriodPreset, period: Period) => void };

export function PeriodPicker({ preset, period, onChange }: Props) {
  const id = useId();
  const options = [...Object.entries(periodPresets).map(([value, p]) => ({ value, label: p.label })), { value: 'custom', label: 'Choose dates…' }];
  return (
    <fieldset className="flex flex-wrap items-end gap-3">
      <legend className="mb-1 font-semibold text-ink">Period</legend>
      <label htmlFor={`${id}-preset`} className="sr-only">Period</label>
      <Select
        id={`${id}-preset`}
        value={preset}
        options={options}
        onChange={(e) => {
          const next = e.target.value as PeriodPreset;
          onChange(next, next === 'custom' ? period : periodPresets[next].period());
        }}
      />
      {preset === 'custom' && (
        <>
          <label className="flex flex-col text-sm text-ink-soft">
            From
            <input type="date" value={period.from} max={period.to} onChange={(e) => e.target.value && onChange('custom', { ...period, from: e.target.value })} className="rounded-md border border-sand bg-paper px-2 py-1.5 text-ink" />
          </label>
          <label className="flex flex-col text-sm text-ink-soft">
            To
            <input type="date" value={period.to} min={period.from} onChange={(e) => e.target.value && onChange('custom', { ...period, to: e.target.value })} className="rounded-md border border-sand bg-paper px-2 py-1.5 text-ink" />
          </label>
        </>
      )}
    </fieldset>
  );
}
