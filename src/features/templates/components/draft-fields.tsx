import { useId } from 'react';
import { TextField } from '../../../components/ui/text-field';

// The form's own small controls: a length typed as text (so "0,125" and a half-typed "0." stay
// as typed) and a colour with both a picker and its hex value.

type LengthFieldProps = {
  label: string;
  name: string;
  value: string;
  unit: string;
  error?: string;
  hint?: string;
  onChange: (value: string) => void;
};

export function LengthField({ label, name, value, unit, error, hint, onChange }: LengthFieldProps) {
  return (
    <TextField
      label={unit ? `${label} (${unit})` : label}
      name={name}
      inputMode="decimal"
      autoComplete="off"
      value={value}
      hint={hint}
      error={error}
      onChange={(e) => onChange(e.target.value)}
    />
  );
}

type ColourFieldProps = { label: string; value: string; onChange: (value: string) => void; optional?: boolean; error?: string };

export function ColourField({ label, value, onChange, optional, error }: ColourFieldProps) {
  const id = useId();
  const valid = /^#[0-9a-f]{6}$/i.test(value);
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-semibold text-ink">
        {label}
        {optional && <span className="ml-1 font-normal text-ink-soft">(optional)</span>}
      </label>
      <div className="flex items-center gap-2">
        <input
          type="color"
          aria-label={`${label}: pick`}
          value={valid ? value : '#ffffff'}
          onChange={(e) => onChange(e.target.value)}
          className="h-10 w-12 shrink-0 cursor-pointer rounded-md border border-sand bg-paper p-1"
        />
        <input
          id={id}
          value={value}
          placeholder={optional ? 'none' : '#ffffff'}
          onChange={(e) => onChange(e.target.value.trim())}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="min-h-10 w-28 rounded-md border border-sand bg-paper px-2 font-mono text-sm text-ink"
        />
        {optional && value && (
          <button type="button" className="text-sm font-semibold text-tide-deep hover:underline" onClick={() => onChange('')}>
            Clear
          </button>
        )}
      </div>
      {error && <p id={`${id}-error`} className="text-sm font-semibold text-rust">{error}</p>}
    </div>
  );
}
