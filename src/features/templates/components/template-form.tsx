import { useMemo, useRef, useState, type FocusEvent, type FormEvent, type ReactNode } from 'react';
import { checkDraft, templateInputFromDraft, type TemplateDraft } from '@shared/templates/template-draft';
import type { Template } from '@shared/templates/template-schema';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { useSaveTemplate } from '../api/save-template';
import { TemplateBasicFields, TemplateOutputFields, TemplateWrapFields } from './template-basic-fields';
import { TemplateColourFields } from './template-colour-fields';
import { TemplateDiagram } from './template-diagram';
import { TemplateZoneFields } from './template-zone-fields';

type Props = {
  initial: TemplateDraft;
  templateId?: string;
  guideImageUrl?: string | null;
  onSaved: (template: Template) => void;
  onCancel: () => void;
  /** Shown under the form, e.g. the guide image control of a saved template. */
  extra?: ReactNode;
};

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="flex flex-col gap-4 rounded-lg border border-sand bg-paper p-5">
      <h2 className="text-lg font-semibold text-ink">{title}</h2>
      {children}
    </section>
  );
}

// A studio template from its printer's figures, checked as it is typed by the same schema the
// server uses, and drawn to scale beside the form.
export function TemplateForm({ initial, templateId, guideImageUrl, onSaved, onCancel, extra }: Props) {
  const [draft, setDraft] = useState(initial);
  const [showAll, setShowAll] = useState(false);
  const [touched, setTouched] = useState<Set<string>>(() => new Set());
  const check = useMemo(() => checkDraft(draft, templateId ?? 'draft'), [draft, templateId]);
  const lastGood = useRef<Template | null>(check.ok ? check.template : null);
  if (check.ok) lastGood.current = check.template;
  const save = useSaveTemplate({ mutationConfig: { onSuccess: onSaved } });
  const serverFields = save.error?.fields ?? {};

  const liveErrors = check.ok ? {} : check.fields;
  const errors: Record<string, string> = {};
  for (const [field, message] of Object.entries({ ...serverFields, ...liveErrors })) {
    if (showAll || [...touched].some((t) => field === t || field.startsWith(`${t}.`))) errors[field] = message;
  }

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setShowAll(true);
    if (!check.ok) return;
    save.mutate({ id: templateId, template: templateInputFromDraft(draft) });
  };
  // a field counts as touched once the person leaves it
  const onBlur = (e: FocusEvent<HTMLFormElement>) => {
    const name = e.target instanceof HTMLInputElement || e.target instanceof HTMLSelectElement ? e.target.name : '';
    if (name && !touched.has(name)) setTouched(new Set(touched).add(name));
  };
  const problemCount = check.ok ? 0 : Object.keys(check.fields).length;

  return (
    <form onSubmit={submit} onBlur={onBlur} noValidate className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,28rem)]" aria-label={templateId ? 'Change the template' : 'New template'}>
      <div className="flex flex-col gap-5">
        <Section title="Size and resolution">
          <TemplateBasicFields draft={draft} errors={errors} onChange={setDraft} />
        </Section>
        {draft.wrap && (
          <Section title="The mug blank">
            <TemplateWrapFields draft={draft} errors={errors} onChange={setDraft} />
          </Section>
        )}
        <Section title="Where ink may go">
          <TemplateZoneFields draft={draft} errors={errors} onChange={setDraft} />
        </Section>
        <Section title="The file the printer wants">
          <TemplateOutputFields draft={draft} errors={errors} onChange={setDraft} />
        </Section>
        <Section title="Blank colours">
          <TemplateColourFields draft={draft} errors={errors} onChange={setDraft} />
        </Section>
        {extra}
        {showAll && !check.ok && (
          <StatusMessage tone="problem" title={`${problemCount} ${problemCount === 1 ? 'figure needs' : 'figures need'} a look`}>
            {check.message}
          </StatusMessage>
        )}
        {save.isError && !save.error.fields && <StatusMessage tone="problem">{save.error.message}</StatusMessage>}
        {save.isSuccess && !save.isPending && <StatusMessage tone="ok">Saved. Products on this template use the new figures from their next render.</StatusMessage>}
        <div className="flex flex-wrap gap-3">
          <Button type="submit" busy={save.isPending}>{templateId ? 'Save changes' : 'Save template'}</Button>
          <Button type="button" variant="secondary" onClick={onCancel}>Cancel</Button>
        </div>
      </div>
      <aside className="lg:sticky lg:top-4 lg:self-start" aria-label="Diagram">
        {lastGood.current ? (
          <TemplateDiagram template={{ ...lastGood.current, name: draft.name || lastGood.current.name }} guideImageUrl={guideImageUrl} />
        ) : (
          <p className="rounded-md border border-dashed border-sand p-6 text-ink-soft">The diagram appears once the size, resolution and margins are filled in.</p>
        )}
        {!check.ok && lastGood.current && <p className="mt-2 text-sm text-ink-soft">Showing the last figures that worked; {problemCount} still {problemCount === 1 ? 'needs' : 'need'} a look.</p>}
      </aside>
    </form>
  );
}
