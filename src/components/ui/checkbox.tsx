import { useId, type InputHTMLAttributes, type ReactNode } from 'react';
import { classNames } from './class-names';

type CheckboxProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'type' | 'id'> & { label: ReactNode; hint?: ReactNode };

export function Checkbox({ label, hint, className, ...rest }: CheckboxProps) {
  const id = useId();
  return (
    <div className={classNames('flex items-start gap-2', className)}>
      <input id={id} type="checkbox" className="mt-1 size-4 shrink-0 accent-tide" aria-describedby={hint ? `${id}-hint` : undefined} {...rest} />
      <span>
        <label htmlFor={id} className="text-ink">
          {label}
        </label>
        {hint && (
          <span id={`${id}-hint`} className="block text-sm text-ink-soft">
            {hint}
          </span>
        )}
      </span>
    </div>
  );
}
