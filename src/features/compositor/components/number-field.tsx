import { useEffect, useId, useState } from 'react';

type NumberFieldProps = {
  label: string;
  value: number;
  /** Shown after the field, e.g. "px" or "°". */
  unit?: string;
  digits?: number;
  /** Called once per edit (Enter or leaving the field), so typing "120" is one undo step, not three. */
  onCommit: (value: number) => void;
  disabled?: boolean;
};

export function NumberField({ label, value, unit, digits = 1, onCommit, disabled }: NumberFieldProps) {
  const id = useId();
  const shown = formatNumber(value, digits);
  const [text, setText] = useState(shown);
  useEffect(() => setText(shown), [shown]);
  const commit = () => {
    const n = Number(text.replace(',', '.'));
    if (Number.isFinite(n) && formatNumber(n, digits) !== shown) onCommit(n);
    else setText(shown);
  };
  return (
    <div className="flex items-center gap-1.5">
      <label htmlFor={id} className="w-16 shrink-0 text-xs text-ink-soft">{label}</label>
      <input
        id={id}
        inputMode="decimal"
        value={text}
        disabled={disabled}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') setText(shown);
        }}
        className="w-full min-w-0 rounded border border-sand bg-white px-1.5 py-0.5 text-sm tabular-nums disabled:bg-shell"
      />
      {unit && <span className="w-6 shrink-0 text-xs text-ink-soft">{unit}</span>}
    </div>
  );
}

export function formatNumber(n: number, digits: number): string {
  const f = 10 ** digits;
  return String(Math.round(n * f) / f);
}
