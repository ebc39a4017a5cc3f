import type { ReactNode } from 'react';

// Shared wiring of a labelled control: the hint and the error each get an id, and the control
// lists both in aria-describedby so a screen reader reads them after the label.
export function describedBy(id: string, hint?: ReactNode, error?: string): string | undefined {
  const ids = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean);
  return ids.length ? ids.join(' ') : undefined;
}

type FieldFrameProps = {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
  /** Below the control suits a hint that changes with the value (it would shift the control). */
  hintPlacement?: 'above' | 'below';
  children: ReactNode;
};

export function FieldFrame({ id, label, hint, error, optional, hintPlacement = 'above', children }: FieldFrameProps) {
  const hintText = hint && (
    <p id={`${id}-hint`} className={hintPlacement === 'above' ? '-mt-1 text-sm text-ink-soft' : 'text-sm text-ink-soft'}>
      {hint}
    </p>
  );
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="font-semibold text-ink">
        {label}
        {optional && <span className="ml-1 font-normal text-ink-soft">(optional)</span>}
      </label>
      {hintPlacement === 'above' && hintText}
      {children}
      {hintPlacement === 'below' && hintText}
      {error && (
        <p id={`${id}-error`} className="flex items-start gap-1.5 text-sm font-semibold text-rust">
          <svg viewBox="0 0 16 16" className="mt-0.5 size-4 shrink-0" aria-hidden="true" focusable="false">
            <circle cx="8" cy="8" r="7" fill="currentColor" />
            <path d="M8 4.2v4.6M8 11.2v.2" stroke="var(--color-paper)" strokeWidth="1.8" strokeLinecap="round" />
          </svg>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}

export const controlClasses =
  'w-full rounded-md border bg-paper px-3 py-2 text-base text-ink shadow-paper ' +
  'placeholder:text-ink-soft/70 ' +
  'disabled:cursor-not-allowed disabled:bg-shell disabled:text-ink-soft';

export function borderFor(error?: string) {
  return error ? 'border-rust' : 'border-sand hover:border-ink-soft/50';
}
