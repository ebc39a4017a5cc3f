import { useId, type ComponentPropsWithRef, type ReactNode, type SelectHTMLAttributes } from 'react';
import { classNames } from './class-names';
import { borderFor, controlClasses, describedBy, FieldFrame } from './field-parts';

export type SelectOption = { value: string; label: string };

type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  label: ReactNode;
  name: string;
  options: readonly SelectOption[];
  hint?: ReactNode;
  hintPlacement?: 'above' | 'below';
  error?: string;
};

export function SelectField({ label, hint, hintPlacement, error, options, className, ...rest }: SelectFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} hintPlacement={hintPlacement} error={error}>
      <Select
        id={id}
        options={options}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={classNames(borderFor(error), className)}
        {...rest}
      />
    </FieldFrame>
  );
}

type SelectProps = ComponentPropsWithRef<'select'> & { options: readonly SelectOption[] };

// A bare select for places where the label sits elsewhere (a table row names it with aria-label).
export function Select({ options, className, ...rest }: SelectProps) {
  return (
    <span className="relative block">
      <select
        className={classNames(controlClasses, 'appearance-none pr-9', className ?? 'border-sand')}
        {...rest}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      <svg
        viewBox="0 0 16 16"
        className="pointer-events-none absolute top-1/2 right-3 size-4 -translate-y-1/2 text-ink-soft"
        aria-hidden="true"
        focusable="false"
      >
        <path d="M4 6l4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
      </svg>
    </span>
  );
}
