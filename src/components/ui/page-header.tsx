import { useEffect, type ReactNode } from 'react';

type PageHeaderProps = { title: string; description?: ReactNode; actions?: ReactNode };

// Every page renders its heading before its data loads: navigation moves focus to this
// heading (see RouteFocus), and the document title follows it.
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  useEffect(() => {
    document.title = `${title} · Motifold`;
  }, [title]);
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        <h1 tabIndex={-1} data-page-heading className="text-3xl font-semibold tracking-tight text-ink">
          {title}
        </h1>
        {description && <div className="mt-1 max-w-2xl text-lg text-ink-soft">{description}</div>}
      </div>
      {actions && <div className="flex items-center gap-2">{actions}</div>}
    </header>
  );
}
