import type { Recolour } from '@shared/colour';
import { Select } from '../../../components/ui/select-field';

type RecolourFieldsProps = {
  value: Recolour;
  /** A live change while a slider moves or a colour is picked; `done` ends the step for undo. */
  onChange: (recolour: Recolour) => void;
  onDone: () => void;
};

const kinds = [
  { value: 'none', label: 'As drawn' },
  { value: 'hue', label: 'Shift the hue' },
  { value: 'fill', label: 'One solid colour' },
  { value: 'swap', label: 'Swap one colour' },
] as const;

const startOf = (kind: Recolour['kind'], current: Recolour): Recolour => {
  switch (kind) {
    case 'none': return { kind: 'none' };
    case 'hue': return { kind: 'hue', degrees: current.kind === 'hue' ? current.degrees : 30 };
    case 'fill': return { kind: 'fill', colour: current.kind === 'fill' ? current.colour : '#1f6f8b' };
    // pale blue snow: the demo's own example of a swap
    case 'swap': return current.kind === 'swap' ? current : { kind: 'swap', from: '#ffffff', to: '#cfe3f2', tolerance: 0.1 };
  }
};

export function RecolourFields({ value, onChange, onDone }: RecolourFieldsProps) {
  const end = { onPointerUp: onDone, onKeyUp: onDone, onBlur: onDone };
  return (
    <fieldset className="space-y-2">
      <legend className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Colour</legend>
      <Select
        aria-label="Recolour"
        value={value.kind}
        options={kinds}
        className="border-sand text-sm"
        onChange={(e) => {
          onChange(startOf(e.target.value as Recolour['kind'], value));
          onDone();
        }}
      />
      {value.kind === 'hue' && (
        <label className="block text-xs text-ink-soft">
          Hue shift: {Math.round(value.degrees)}°
          <input type="range" min={-180} max={180} step={1} value={value.degrees} className="block w-full"
            onChange={(e) => onChange({ kind: 'hue', degrees: Number(e.target.value) })} {...end} />
        </label>
      )}
      {value.kind === 'fill' && (
        <label className="flex items-center gap-2 text-xs text-ink-soft">
          Fill colour
          <input type="color" value={value.colour} onChange={(e) => onChange({ kind: 'fill', colour: e.target.value })} {...end} />
        </label>
      )}
      {value.kind === 'swap' && (
        <div className="space-y-1.5">
          <label className="flex items-center gap-2 text-xs text-ink-soft">
            Replace
            <input type="color" value={value.from} onChange={(e) => onChange({ ...value, from: e.target.value })} {...end} />
            with
            <input type="color" value={value.to} onChange={(e) => onChange({ ...value, to: e.target.value })} {...end} />
          </label>
          <label className="block text-xs text-ink-soft">
            Tolerance: {value.tolerance.toFixed(2)} (OKLab distance)
            <input type="range" min={0} max={0.5} step={0.01} value={value.tolerance} className="block w-full"
              onChange={(e) => onChange({ ...value, tolerance: Number(e.target.value) })} {...end} />
          </label>
        </div>
      )}
    </fieldset>
  );
}
