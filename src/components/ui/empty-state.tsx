import type { ReactNode } from 'react';
import { classNames } from './class-names';

type EmptyStateProps = { title: ReactNode; children?: ReactNode; action?: ReactNode; className?: string };

export function EmptyState({ title, children, action, className }: EmptyStateProps) {
  return (
    <div
      className={classNames(
        'flex flex-col items-start gap-2 rounded-lg border border-dashed border-sand bg-shell/60 px-5 py-6',
        className,
      )}
    >
      <p className="font-semibold text-ink">{title}</p>
      {children && <div className="text-ink-soft">{children}</div>}
      {action && <div className="mt-2">{action}</div>}
    </div>
  );
}
