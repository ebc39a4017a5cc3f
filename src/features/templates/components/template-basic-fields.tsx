import type { TemplateDraft } from '@shared/templates/template-draft';
import { withKind } from '@shared/templates/template-draft';
import type { TemplateKind } from '@shared/templates/template-schema';
import { RadioGroup } from '../../../components/ui/radio-group';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { LengthField } from './draft-fields';

type Props = { draft: TemplateDraft; errors: Record<string, string>; onChange: (next: TemplateDraft) => void };

export const kindOptions: { value: TemplateKind; label: string }[] = [
  { value: 'mug-wrap', label: 'Mug wrap' },
  { value: 'card', label: 'Card' },
  { value: 'tote', label: 'Tote bag panel' },
  { value: 'print', label: 'Art print' },
  { value: 'sticker-sheet', label: 'Sticker sheet' },
  { value: 'custom', label: 'Something else' },
];

export function TemplateBasicFields({ draft, errors, onChange }: Props) {
  const set = <K extends keyof TemplateDraft>(key: K) => (value: TemplateDraft[K]) => onChange({ ...draft, [key]: value });
  return (
    <div className="flex flex-col gap-4">
      <TextField label="Template name" name="name" value={draft.name} error={errors.name} onChange={(e) => set('name')(e.target.value)} placeholder="Harbour Press 11 oz mug" />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Kind of product" name="kind" value={draft.kind} options={kindOptions} onChange={(e) => onChange(withKind(draft, e.target.value as TemplateKind))} />
        <RadioGroup
          legend="Measured in"
          name="unit"
          inline
          value={draft.unit}
          options={[
            { value: 'in', label: 'inches' },
            { value: 'mm', label: 'millimetres' },
          ]}
          onChange={(unit) => set('unit')(unit)}
        />
      </div>
      <div className="grid gap-4 sm:grid-cols-3">
        <LengthField label="Trim width" name="size.width" unit={draft.unit} value={draft.width} error={errors['size.width'] ?? errors.size} onChange={set('width')} />
        <LengthField label="Trim height" name="size.height" unit={draft.unit} value={draft.height} error={errors['size.height']} onChange={set('height')} />
        <LengthField label="Resolution" name="dpi" unit="DPI" value={draft.dpi} error={errors.dpi ?? errors['output.dpi']} onChange={set('dpi')} />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <LengthField label="Bleed on each side" name="bleed" unit={draft.unit} value={draft.bleed} error={errors.bleed} onChange={set('bleed')} hint="Artwork past the trim, cut away." />
        <LengthField label="Safe margin" name="safeMargin" unit={draft.unit} value={draft.safeMargin} error={errors.safeMargin} onChange={set('safeMargin')} hint="Keep text and faces this far inside the trim." />
      </div>
    </div>
  );
}

export function TemplateWrapFields({ draft, errors, onChange }: Props) {
  if (!draft.wrap) return null;
  const wrap = draft.wrap;
  const set = (key: keyof typeof wrap) => (value: string) => onChange({ ...draft, wrap: { ...wrap, [key]: value } });
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <LengthField label="Blank diameter" name="wrap.diameter" unit={draft.unit} value={wrap.diameter} error={errors['wrap.diameter'] ?? errors.wrap} onChange={set('diameter')} />
      <LengthField label="Blank height" name="wrap.height" unit={draft.unit} value={wrap.height} error={errors['wrap.height'] ?? errors['size.height']} onChange={set('height')} />
      <LengthField label="Handle centre, from the strip's left edge" name="wrap.handleX" unit={draft.unit} value={wrap.handleX} error={errors['wrap.handleX']} onChange={set('handleX')} hint="May lie outside the strip, in the unprinted gap." />
      <LengthField label="Seam, from the strip's left edge" name="wrap.seamX" unit={draft.unit} value={wrap.seamX} error={errors['wrap.seamX']} onChange={set('seamX')} hint="Where the two ends of the strip meet." />
    </div>
  );
}

export function TemplateOutputFields({ draft, errors, onChange }: Props) {
  const output = draft.output;
  const set = <K extends keyof typeof output>(key: K) => (value: (typeof output)[K]) => onChange({ ...draft, output: { ...output, [key]: value } });
  return (
    <div className="grid gap-4 sm:grid-cols-3">
      <SelectField
        label="File type"
        name="output.format"
        value={output.format}
        options={[
          { value: 'png', label: 'PNG' },
          { value: 'jpeg', label: 'JPEG' },
        ]}
        onChange={(e) => {
          const format = e.target.value as 'png' | 'jpeg';
          onChange({ ...draft, output: { ...output, format, transparency: format === 'jpeg' ? 'flatten' : output.transparency } });
        }}
      />
      <SelectField
        label="Transparency"
        name="output.transparency"
        value={output.transparency}
        error={errors['output.transparency']}
        options={[
          { value: 'keep', label: 'Keep it (PNG only)' },
          { value: 'flatten', label: 'Flatten onto white' },
        ]}
        onChange={(e) => set('transparency')(e.target.value as 'keep' | 'flatten')}
      />
      <LengthField label="Largest file the printer takes" name="output.maxFileSizeMb" unit="MB" value={output.maxFileSizeMb} error={errors['output.maxFileSizeMb']} onChange={set('maxFileSizeMb')} />
    </div>
  );
}
