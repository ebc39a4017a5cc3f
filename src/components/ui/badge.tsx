import type { ReactNode } from 'react';
import { classNames } from './class-names';

export type BadgeTone = 'neutral' | 'tide' | 'kelp' | 'ochre' | 'rust';

const tones: Record<BadgeTone, string> = {
  neutral: 'border-sand bg-shell text-ink',
  tide: 'border-tide/40 bg-tide/10 text-tide-deep',
  kelp: 'border-kelp/50 bg-kelp/12 text-ink',
  ochre: 'border-ochre/60 bg-ochre/15 text-ink',
  rust: 'border-rust/50 bg-rust/10 text-rust',
};

// A small label beside a name. Colour is never the only signal: the words carry the meaning.
export function Badge({ tone = 'neutral', children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return (
    <span
      className={classNames(
        'inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-semibold whitespace-nowrap',
        tones[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}
