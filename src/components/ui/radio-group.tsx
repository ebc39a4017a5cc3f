import { useId, type ReactNode } from 'react';
import { classNames } from './class-names';

export type RadioOption<V extends string> = { value: V; label: ReactNode; hint?: ReactNode };

type RadioGroupProps<V extends string> = {
  legend: ReactNode;
  name: string;
  value: V;
  options: readonly RadioOption<V>[];
  onChange: (value: V) => void;
  disabled?: boolean;
  className?: string;
  /** Options side by side when there is room. */
  inline?: boolean;
};

export function RadioGroup<V extends string>({ legend, name, value, options, onChange, disabled, className, inline }: RadioGroupProps<V>) {
  const id = useId();
  return (
    <fieldset className={classNames('flex flex-col gap-2', className)} disabled={disabled}>
      <legend className="mb-1 font-semibold text-ink">{legend}</legend>
      <div className={classNames('flex gap-2', inline ? 'flex-wrap' : 'flex-col')}>
        {options.map((option) => {
          const optionId = `${id}-${option.value}`;
          return (
            <div key={option.value} className="flex items-start gap-2">
              <input
                id={optionId}
                type="radio"
                name={name}
                value={option.value}
                checked={value === option.value}
                onChange={() => onChange(option.value)}
                aria-describedby={option.hint ? `${optionId}-hint` : undefined}
                className="mt-1 size-4 shrink-0 accent-tide"
              />
              <span>
                <label htmlFor={optionId} className="text-ink">
                  {option.label}
                </label>
                {option.hint && (
                  <span id={`${optionId}-hint`} className="block text-sm text-ink-soft">
                    {option.hint}
                  </span>
                )}
              </span>
            </div>
          );
        })}
      </div>
    </fieldset>
  );
}
