import { useState } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import type { TemplateEntry } from '@shared/contracts/products';
import { draftFromTemplate, type TemplateDraft } from '@shared/templates/template-draft';
import { card5x7Front } from '@shared/templates/built-in-flat';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { StatusMessage } from '../../../components/ui/status-message';
import { useSession } from '../../auth/components/session';
import { useTemplates } from '../../products/api/get-templates';
import { useDeleteTemplate } from '../api/delete-template';
import { GuideImageField } from '../components/guide-image-field';
import { TemplateDiagram } from '../components/template-diagram';
import { TemplateForm } from '../components/template-form';
import { kindLabel, templateSummary } from '../template-words';

function blankDraft(from: TemplateEntry | undefined): TemplateDraft {
  if (from) return { ...draftFromTemplate(from.template), name: `${from.template.name} (our printer)` };
  return { ...draftFromTemplate(card5x7Front), name: '', keepOuts: [] };
}

// /templates/new (optionally ?from=<built-in id>) and /templates/:templateId
export function TemplatePage() {
  const { templateId } = useParams();
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useSession();
  const canEdit = can(me.role, 'products.compose');
  const templates = useTemplates();
  const isNew = !templateId;
  const entry = templates.data?.templates.find((e) => e.template.id === templateId);
  const from = templates.data?.templates.find((e) => e.template.id === params.get('from'));
  const title = isNew ? 'New template' : (entry?.template.name ?? 'Template');

  if (templates.isPending) return <><PageHeader title={title} /><LoadingState /></>;
  if (templates.isError) return <><PageHeader title={title} /><ErrorState error={templates.error} onRetry={() => void templates.refetch()} /></>;
  if (!isNew && !entry) {
    return (
      <>
        <PageHeader title="Template not found" />
        <StatusMessage tone="problem">This template does not exist in your studio. <Link className="font-semibold underline" to="/templates">See all templates</Link></StatusMessage>
      </>
    );
  }
  const back = () => navigate('/templates');

  if (isNew) {
    return (
      <>
        <PageHeader title={title} description={from ? `Starting from “${from.template.name}”. Change any figure to match your printer.` : 'Enter the figures from your printer\'s spec sheet.'} />
        {canEdit ? (
          <TemplateForm key={from?.template.id ?? 'blank'} initial={blankDraft(from)} onSaved={(t) => navigate(`/templates/${t.id}`, { replace: true })} onCancel={back} />
        ) : (
          <StatusMessage tone="info">Only owners and editors add templates.</StatusMessage>
        )}
      </>
    );
  }

  const t = entry!.template;
  if (entry!.source === 'built-in' || !canEdit) {
    return (
      <>
        <PageHeader
          title={t.name}
          description={`${kindLabel(t.kind)} · ${templateSummary(t)}`}
          actions={canEdit && <Link to={`/templates/new?from=${encodeURIComponent(t.id)}`} className={buttonClasses('primary')}>Start a studio template from this</Link>}
        />
        {entry!.source === 'built-in' && <p className="mb-4 text-ink-soft">Built-in templates use common figures and cannot be changed. Check them against your printer's own.</p>}
        <div className="max-w-3xl"><TemplateDiagram template={t} guideImageUrl={entry!.guideImageUrl} /></div>
      </>
    );
  }
  return <StudioTemplateEditor entry={entry!} onDone={back} />;
}

function StudioTemplateEditor({ entry, onDone }: { entry: TemplateEntry; onDone: () => void }) {
  const t = entry.template;
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteTemplate({ mutationConfig: { onSuccess: onDone } });
  return (
    <>
      <PageHeader
        title={t.name}
        description={`${kindLabel(t.kind)} · ${templateSummary(t)} · used by ${entry.productCount} ${entry.productCount === 1 ? 'product' : 'products'}`}
        actions={<Button variant="secondary" onClick={() => setConfirming(true)}>Delete template</Button>}
      />
      <TemplateForm
        key={t.id}
        templateId={t.id}
        initial={draftFromTemplate(t)}
        guideImageUrl={entry.guideImageUrl}
        onSaved={() => {}}
        onCancel={onDone}
        extra={<GuideImageField templateId={t.id} guideImageUrl={entry.guideImageUrl} />}
      />
      <Dialog
        open={confirming}
        onClose={() => setConfirming(false)}
        title={`Delete “${t.name}”?`}
        description={entry.productCount > 0 ? `${entry.productCount} products use it; move them to another template first.` : 'Products never used it. This cannot be undone.'}
        actions={
          <>
            <Button variant="danger" data-autofocus busy={remove.isPending} disabled={entry.productCount > 0} onClick={() => remove.mutate({ id: t.id })}>Delete</Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>Keep it</Button>
          </>
        }
      >
        {remove.isError && <StatusMessage tone="problem">{remove.error.message}</StatusMessage>}
      </Dialog>
    </>
  );
}
