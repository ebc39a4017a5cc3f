import { useEffect, useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { controlClasses } from '../../../components/ui/field-parts';

const hexPattern = /^#?([0-9a-f]{6}|[0-9a-f]{3})$/i;

export function normaliseHex(text: string): string | null {
  const match = hexPattern.exec(text.trim());
  if (!match) return null;
  const digits = match[1].length === 3 ? [...match[1]].map((d) => d + d).join('') : match[1];
  return `#${digits.toLowerCase()}`;
}

type ColourFilterProps = { colour: string | null; onChange: (colour: string | null) => void };

// A colour picker for the mouse, and the same colour as hex text for typing and pasting.
export function ColourFilter({ colour, onChange }: ColourFilterProps) {
  const id = useId();
  const [text, setText] = useState(colour ?? '');
  useEffect(() => setText(colour ?? ''), [colour]);
  const invalid = text.trim() !== '' && normaliseHex(text) === null;

  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="mb-1 font-semibold text-ink">Colour</legend>
      <p id={`${id}-hint`} className="-mt-1 text-sm text-ink-soft">
        Motifs with a main colour close to this one, nearest first. Or click a colour dot under any motif.
      </p>
      <div className="flex items-center gap-2">
        <input
          id={`${id}-picker`}
          type="color"
          aria-label="Pick a colour"
          value={normaliseHex(colour ?? '') ?? '#1d6f6a'}
          onChange={(event) => onChange(event.target.value)}
          className="h-10 w-12 shrink-0 cursor-pointer rounded-md border border-sand bg-paper p-1"
        />
        <label htmlFor={`${id}-hex`} className="sr-only">
          Colour as hex
        </label>
        <input
          id={`${id}-hex`}
          type="text"
          inputMode="text"
          spellCheck={false}
          placeholder="#c8283c"
          value={text}
          aria-describedby={`${id}-hint`}
          aria-invalid={invalid || undefined}
          onChange={(event) => {
            setText(event.target.value);
            const hex = normaliseHex(event.target.value);
            if (hex) onChange(hex);
          }}
          className={`${controlClasses} ${invalid ? 'border-rust' : 'border-sand'} font-mono`}
        />
      </div>
      {invalid && <p className="text-sm font-semibold text-rust">Write a colour as #rrggbb, for example #c8283c.</p>}
      {colour && (
        <Button variant="quiet" size="sm" className="self-start" onClick={() => onChange(null)}>
          Any colour
        </Button>
      )}
    </fieldset>
  );
}
