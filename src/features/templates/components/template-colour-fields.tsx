import type { TemplateDraft, VariantDraft } from '@shared/templates/template-draft';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/text-field';
import { ColourField } from './draft-fields';

type Props = { draft: TemplateDraft; errors: Record<string, string>; onChange: (next: TemplateDraft) => void };

const slug = (name: string) => name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60);

// The blank's own colours (previews and text contrast use them) and the colour variants it comes in.
export function TemplateColourFields({ draft, errors, onChange }: Props) {
  const isWrap = draft.kind === 'mug-wrap';
  const setBlank = (key: keyof TemplateDraft['blank']) => (value: string) => onChange({ ...draft, blank: { ...draft.blank, [key]: value } });
  const setVariant = (i: number, next: VariantDraft) => onChange({ ...draft, variants: draft.variants.map((v, j) => (j === i ? next : v)) });
  const addVariant = () =>
    onChange({ ...draft, variants: [...draft.variants, { id: `variant-${Date.now().toString(36)}`, name: '', body: '', handle: '', inside: '', rim: '' }] });

  return (
    <div className="flex flex-col gap-5">
      <div className="grid gap-4 sm:grid-cols-2">
        <ColourField label="Blank body" value={draft.blank.body} error={errors['blank.body']} onChange={setBlank('body')} />
        {isWrap && <ColourField label="Inside" optional value={draft.blank.inside} error={errors['blank.inside']} onChange={setBlank('inside')} />}
        {isWrap && <ColourField label="Handle" optional value={draft.blank.handle} error={errors['blank.handle']} onChange={setBlank('handle')} />}
        {isWrap && <ColourField label="Rim" optional value={draft.blank.rim} error={errors['blank.rim']} onChange={setBlank('rim')} />}
      </div>
      <div className="flex flex-col gap-3">
        <h3 className="font-semibold text-ink">Colour variants of the blank</h3>
        {draft.variants.length === 0 && <p className="text-ink-soft">None. Add the colours your printer offers, such as a navy handle.</p>}
        {draft.variants.map((v, i) => (
          <fieldset key={v.id} className="flex flex-col gap-3 rounded-md border border-sand p-3">
            <legend className="px-1 font-semibold text-ink">{v.name || `Variant ${i + 1}`}</legend>
            <TextField
              label="Variant name"
              name={`variants.${i}.name`}
              value={v.name}
              error={errors[`variants.${i}.name`]}
              onChange={(e) => {
                const name = e.target.value;
                // a fresh variant takes its id from its first name, so product variants read well
                const id = v.id.startsWith('variant-') && slug(name) ? slug(name) : v.id;
                setVariant(i, { ...v, name, id: draft.variants.some((o, j) => j !== i && o.id === id) ? v.id : id });
              }}
            />
            <div className="grid gap-4 sm:grid-cols-2">
              <ColourField label="Body" optional value={v.body} error={errors[`variants.${i}.blank.body`]} onChange={(body) => setVariant(i, { ...v, body })} />
              {isWrap && <ColourField label="Handle" optional value={v.handle} error={errors[`variants.${i}.blank.handle`]} onChange={(handle) => setVariant(i, { ...v, handle })} />}
              {isWrap && <ColourField label="Inside" optional value={v.inside} error={errors[`variants.${i}.blank.inside`]} onChange={(inside) => setVariant(i, { ...v, inside })} />}
              {isWrap && <ColourField label="Rim" optional value={v.rim} error={errors[`variants.${i}.blank.rim`]} onChange={(rim) => setVariant(i, { ...v, rim })} />}
            </div>
            <div>
              <Button type="button" variant="quiet" size="sm" onClick={() => onChange({ ...draft, variants: draft.variants.filter((_, j) => j !== i) })}>
                Remove {v.name || 'this variant'}
              </Button>
            </div>
          </fieldset>
        ))}
        {errors.variants && <p className="text-sm font-semibold text-rust">{errors.variants}</p>}
        <div>
          <Button type="button" variant="secondary" size="sm" onClick={addVariant} disabled={draft.variants.length >= 50}>
            Add a colour variant
          </Button>
        </div>
      </div>
    </div>
  );
}
