import type { ReactNode } from 'react';
import { errorMessageOf } from '../../lib/use-form-errors';
import { Button } from './button';
import { classNames } from './class-names';

type ErrorStateProps = {
  error: unknown;
  title?: ReactNode;
  onRetry?: () => void;
  retrying?: boolean;
  className?: string;
  children?: ReactNode;
};

export function ErrorState({ error, title = 'This could not be loaded', onRetry, retrying, className, children }: ErrorStateProps) {
  return (
    <div role="alert" className={classNames('rounded-lg border border-rust/50 bg-rust/6 px-5 py-5', className)}>
      <p className="font-semibold text-ink">{title}</p>
      <p className="mt-1 text-ink-soft">{errorMessageOf(error)}</p>
      {children}
      {onRetry && (
        <Button variant="secondary" size="sm" className="mt-4" onClick={onRetry} busy={retrying} busyLabel="Trying again…">
          Try again
        </Button>
      )}
    </div>
  );
}
