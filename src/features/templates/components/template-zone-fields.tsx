import type { KeepOutDraft, RectDraft, TemplateDraft } from '@shared/templates/template-draft';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { LengthField } from './draft-fields';

type Props = { draft: TemplateDraft; errors: Record<string, string>; onChange: (next: TemplateDraft) => void };

const reasons = [
  { value: 'handle', label: 'Behind the handle' },
  { value: 'fold', label: 'A fold or crease' },
  { value: 'other', label: 'Other' },
] as const;

function RectFields({ rect, path, unit, errors, onChange }: { rect: RectDraft; path: string; unit: string; errors: Record<string, string>; onChange: (r: RectDraft) => void }) {
  const set = (key: keyof RectDraft) => (value: string) => onChange({ ...rect, [key]: value });
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
      <LengthField label="From left" name={`${path}.x`} unit={unit} value={rect.x} error={errors[`${path}.x`]} onChange={set('x')} />
      <LengthField label="From top" name={`${path}.y`} unit={unit} value={rect.y} error={errors[`${path}.y`]} onChange={set('y')} />
      <LengthField label="Width" name={`${path}.width`} unit={unit} value={rect.width} error={errors[`${path}.width`]} onChange={set('width')} />
      <LengthField label="Height" name={`${path}.height`} unit={unit} value={rect.height} error={errors[`${path}.height`]} onChange={set('height')} />
    </div>
  );
}

// Where ink may go, and where it must not: a print area smaller than the file, keep-clear zones.
export function TemplateZoneFields({ draft, errors, onChange }: Props) {
  const setKeepOut = (i: number, next: KeepOutDraft) => onChange({ ...draft, keepOuts: draft.keepOuts.map((k, j) => (j === i ? next : k)) });
  const addKeepOut = () => {
    const n = draft.keepOuts.length + 1;
    onChange({
      ...draft,
      keepOuts: [...draft.keepOuts, { id: `zone-${Date.now().toString(36)}`, label: `Keep clear ${n}`, reason: 'other', rect: { x: '0', y: '0', width: '', height: draft.height } }],
    });
  };
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-col gap-3">
        <Checkbox
          label="The printer prints only part of the file"
          hint="Measured from the trim's top-left corner. Leave off when ink may cover the whole file."
          checked={draft.printArea !== null}
          onChange={(e) => onChange({ ...draft, printArea: e.target.checked ? { x: '0', y: '0', width: draft.width, height: draft.height } : null })}
        />
        {draft.printArea && <RectFields rect={draft.printArea} path="printArea" unit={draft.unit} errors={errors} onChange={(printArea) => onChange({ ...draft, printArea })} />}
      </div>
      <div className="flex flex-col gap-3">
        <h3 className="font-semibold text-ink">Keep-clear zones</h3>
        {draft.keepOuts.length === 0 && <p className="text-ink-soft">None. Add one for a mug's handle strip or a card's fold.</p>}
        {draft.keepOuts.map((k, i) => (
          <fieldset key={k.id} className="flex flex-col gap-3 rounded-md border border-sand p-3">
            <legend className="px-1 font-semibold text-ink">{k.label || `Zone ${i + 1}`}</legend>
            <div className="grid gap-3 sm:grid-cols-2">
              <TextField label="Label" name={`keepOuts.${i}.label`} value={k.label} error={errors[`keepOuts.${i}.label`]} onChange={(e) => setKeepOut(i, { ...k, label: e.target.value })} />
              <SelectField label="Why" name={`keepOuts.${i}.reason`} value={k.reason} options={reasons} onChange={(e) => setKeepOut(i, { ...k, reason: e.target.value as KeepOutDraft['reason'] })} />
            </div>
            <RectFields rect={k.rect} path={`keepOuts.${i}.rect`} unit={draft.unit} errors={errors} onChange={(rect) => setKeepOut(i, { ...k, rect })} />
            <div>
              <Button type="button" variant="quiet" size="sm" onClick={() => onChange({ ...draft, keepOuts: draft.keepOuts.filter((_, j) => j !== i) })}>
                Remove {k.label || 'this zone'}
              </Button>
            </div>
          </fieldset>
        ))}
        <div>
          <Button type="button" variant="secondary" size="sm" onClick={addKeepOut} disabled={draft.keepOuts.length >= 32}>
            Add a keep-clear zone
          </Button>
        </div>
      </div>
    </div>
  );
}
