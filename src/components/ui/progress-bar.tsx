import { useId, type ReactNode } from 'react';
import { classNames } from './class-names';

type ProgressBarProps = {
  label: ReactNode;
  /** 0–100; null while the amount is unknown (the bar then moves without a value). */
  percent: number | null;
  /** Words beside the label, e.g. "4.2 MB of 18 MB". */
  detail?: ReactNode;
  tone?: 'tide' | 'kelp' | 'rust';
  className?: string;
};

const fills = { tide: 'bg-tide', kelp: 'bg-kelp', rust: 'bg-rust' } as const;

// A native-semantics progressbar (WAI-ARIA 1.2 `progressbar`: aria-valuenow only when known).
export function ProgressBar({ label, percent, detail, tone = 'tide', className }: ProgressBarProps) {
  const id = useId();
  const value = percent === null ? null : Math.max(0, Math.min(100, Math.round(percent)));
  return (
    <div className={classNames('flex flex-col gap-1.5', className)}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-3 text-sm">
        <span id={id} className="font-semibold text-ink">
          {label}
        </span>
        <span className="text-ink-soft tabular-nums">
          {detail}
          {detail && value !== null ? ' · ' : ''}
          {value !== null ? `${value} %` : ''}
        </span>
      </div>
      <div
        role="progressbar"
        aria-labelledby={id}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={value ?? undefined}
        aria-valuetext={value === null ? 'Working…' : `${value} percent`}
        className="relative h-2.5 overflow-hidden rounded-full bg-sand"
      >
        {value === null ? (
          <span className={classNames('absolute inset-y-0 w-2/5 rounded-full animate-progress', fills[tone])} />
        ) : (
          <span
            className={classNames('absolute inset-y-0 left-0 rounded-full transition-[width] duration-300', fills[tone])}
            style={{ width: `${value}%` }}
          />
        )}
      </div>
    </div>
  );
}
