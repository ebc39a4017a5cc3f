import type { ReactNode } from 'react';
import { classNames } from './class-names';

type CardProps = {
  title?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Heading level of the title inside the page outline. */
  headingLevel?: 2 | 3;
};

export function Card({ title, description, actions, children, className, headingLevel = 2 }: CardProps) {
  const Heading = headingLevel === 2 ? 'h2' : 'h3';
  return (
    <section className={classNames('rounded-lg border border-sand bg-paper p-5 shadow-paper sm:p-6', className)}>
      {(title || actions) && (
        <header className="mb-4 flex flex-wrap items-start justify-between gap-3">
          <div className="min-w-0">
            {title && <Heading className="text-lg font-semibold text-ink">{title}</Heading>}
            {description && <p className="mt-0.5 text-ink-soft">{description}</p>}
          </div>
          {actions && <div className="flex shrink-0 items-center gap-2">{actions}</div>}
        </header>
      )}
      {children}
    </section>
  );
}
