import { useEffect, type ReactNode } from 'react';

type AuthPanelProps = { title: string; description?: ReactNode; children: ReactNode; footer?: ReactNode };

export function AuthPanel({ title, description, children, footer }: AuthPanelProps) {
  useEffect(() => {
    document.title = `${title} · Motifold`;
  }, [title]);
  return (
    <div className="flex flex-col gap-5">
      <section className="rounded-xl border border-sand bg-paper px-6 py-7 shadow-paper sm:px-8">
        <h1 tabIndex={-1} data-page-heading className="text-2xl font-semibold tracking-tight text-ink">
          {title}
        </h1>
        {description && <div className="mt-1.5 text-ink-soft">{description}</div>}
        <div className="mt-6">{children}</div>
      </section>
      {footer && <div className="px-2 text-center text-ink-soft">{footer}</div>}
    </div>
  );
}

export const textLinkClasses = 'font-semibold text-tide-deep underline decoration-tide/40 underline-offset-2 hover:decoration-tide';
