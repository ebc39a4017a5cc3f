import type { ReactNode } from 'react';
import { classNames } from './class-names';

export type StatusTone = 'ok' | 'info' | 'warning' | 'problem';

const tones: Record<StatusTone, { box: string; mark: string }> = {
  ok: { box: 'border-kelp/60 bg-kelp/10', mark: 'bg-kelp' },
  info: { box: 'border-tide/40 bg-tide/8', mark: 'bg-tide' },
  warning: { box: 'border-ochre/70 bg-ochre/12', mark: 'bg-ochre' },
  problem: { box: 'border-rust/60 bg-rust/8', mark: 'bg-rust' },
};

type StatusMessageProps = {
  tone?: StatusTone;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Marks the message as the place to move focus when a form fails with no field to blame. */
  formMessage?: boolean;
};

// Inline, in the flow of the page, next to what it is about: problems are announced at once
// (role=alert), everything else politely (role=status).
export function StatusMessage({ tone = 'info', title, children, className, formMessage }: StatusMessageProps) {
  const style = tones[tone];
  return (
    <div
      role={tone === 'problem' ? 'alert' : 'status'}
      tabIndex={formMessage ? -1 : undefined}
      data-form-message={formMessage || undefined}
      className={classNames('flex gap-3 rounded-md border px-4 py-3 text-ink', style.box, className)}
    >
      <span className={classNames('mt-1.5 size-2.5 shrink-0 rounded-full', style.mark)} aria-hidden="true" />
      <div className="min-w-0">
        {title && <p className="font-semibold">{title}</p>}
        {children && <div className={title ? 'text-ink-soft' : undefined}>{children}</div>}
      </div>
    </div>
  );
}
