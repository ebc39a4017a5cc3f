import type { CSSProperties, ReactNode } from 'react';
import { classNames } from './class-names';

// Transparent pixels show as a light checkerboard, so a motif's edges and holes are visible.
export const checkerboardStyle = (cell = 12): CSSProperties => ({
  backgroundColor: 'var(--color-paper)',
  backgroundImage:
    'linear-gradient(45deg, var(--color-sand) 25%, transparent 25%, transparent 75%, var(--color-sand) 75%),' +
    'linear-gradient(45deg, var(--color-sand) 25%, transparent 25%, transparent 75%, var(--color-sand) 75%)',
  backgroundSize: `${cell * 2}px ${cell * 2}px`,
  backgroundPosition: `0 0, ${cell}px ${cell}px`,
});

type CheckerboardProps = { children?: ReactNode; className?: string; cell?: number; style?: CSSProperties };

export function Checkerboard({ children, className, cell, style }: CheckerboardProps) {
  return (
    <div className={classNames('overflow-hidden', className)} style={{ ...checkerboardStyle(cell), ...style }}>
      {children}
    </div>
  );
}
