import { useId, type InputHTMLAttributes, type ReactNode } from 'react';
import { classNames } from './class-names';
import { borderFor, controlClasses, describedBy, FieldFrame } from './field-parts';

type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> & {
  label: ReactNode;
  name: string;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
};

export function TextField({ label, hint, error, optional, className, type = 'text', ...rest }: TextFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} optional={optional}>
      <input
        id={id}
        type={type}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={classNames(controlClasses, 'read-only:bg-shell read-only:text-ink-soft', borderFor(error), className)}
        {...rest}
      />
    </FieldFrame>
  );
}
