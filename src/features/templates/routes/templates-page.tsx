import { can } from '@shared/auth/permissions';
import type { TemplateEntry } from '@shared/contracts/products';
import { Badge } from '../../../components/ui/badge';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { Link } from 'react-router-dom';
import { useSession } from '../../auth/components/session';
import { useTemplates } from '../../products/api/get-templates';
import { kindLabel, templateSummary } from '../template-words';

function TemplateRow({ entry, canEdit }: { entry: TemplateEntry; canEdit: boolean }) {
  const t = entry.template;
  return (
    <li className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
      <div className="min-w-0">
        <p className="flex flex-wrap items-center gap-2">
          <Link to={`/templates/${encodeURIComponent(t.id)}`} className="font-semibold text-tide-deep hover:underline">{t.name}</Link>
          <Badge tone={entry.source === 'studio' ? 'tide' : 'neutral'}>{entry.source === 'studio' ? 'Your studio' : 'Built in'}</Badge>
          {entry.guideImageUrl && <Badge tone="kelp">Printer's guide</Badge>}
        </p>
        <p className="text-sm text-ink-soft">
          {kindLabel(t.kind)} · {templateSummary(t)} · {entry.productCount} {entry.productCount === 1 ? 'product' : 'products'}
        </p>
      </div>
      {canEdit && entry.source === 'built-in' && (
        <Link to={`/templates/new?from=${encodeURIComponent(t.id)}`} className={buttonClasses('secondary', 'sm')}>
          Start from this
        </Link>
      )}
    </li>
  );
}

export function TemplatesPage() {
  const me = useSession();
  const canEdit = can(me.role, 'products.compose');
  const templates = useTemplates();
  const list = templates.data?.templates ?? [];
  const own = list.filter((e) => e.source === 'studio');
  const builtIn = list.filter((e) => e.source === 'built-in');
  return (
    <div>
      <PageHeader
        title="Templates"
        description="The print specs your products are laid out on. Built-in ones use common figures; enter your printer's own to be exact."
        actions={canEdit && <Link to="/templates/new" className={buttonClasses('primary')}>New template</Link>}
      />
      {templates.isPending && <LoadingState />}
      {templates.isError && <ErrorState error={templates.error} onRetry={() => void templates.refetch()} />}
      {templates.isSuccess && (
        <div className="flex flex-col gap-8">
          <section aria-labelledby="own-templates">
            <h2 id="own-templates" className="mb-3 text-xl font-semibold text-ink">Your studio's templates</h2>
            {own.length === 0 ? (
              <EmptyState title="None yet">
                Start one from a built-in template below, or from scratch, with the figures from your printer's spec sheet.
              </EmptyState>
            ) : (
              <ul className="divide-y divide-sand rounded-lg border border-sand bg-paper">
                {own.map((e) => <TemplateRow key={e.template.id} entry={e} canEdit={canEdit} />)}
              </ul>
            )}
          </section>
          <section aria-labelledby="built-in-templates">
            <h2 id="built-in-templates" className="mb-3 text-xl font-semibold text-ink">Built in</h2>
            <ul className="divide-y divide-sand rounded-lg border border-sand bg-paper">
              {builtIn.map((e) => <TemplateRow key={e.template.id} entry={e} canEdit={canEdit} />)}
            </ul>
          </section>
        </div>
      )}
    </div>
  );
}
