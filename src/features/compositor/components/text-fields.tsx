import { useEffect, useState } from 'react';
import { mapPlacements, type TextPlacement } from '@shared/scene';
import { Select } from '../../../components/ui/select-field';
import type { ProductEditor } from '../editor';
import { remeasured, SHIPPED_FONTS } from '../text-measure';
import { ArcField } from './arc-field';
import { NumberField } from './number-field';

const aligns = [{ value: 'left', label: 'Left' }, { value: 'centre', label: 'Centre' }, { value: 'right', label: 'Right' }] as const;

export function TextFields({ editor, p }: { editor: ProductEditor; p: TextPlacement }) {
  const dpi = editor.template.dpi;
  const [content, setContent] = useState(p.content);
  useEffect(() => setContent(p.content), [p.content]);
  const [source, setSource] = useState(p.quoteSource);
  useEffect(() => setSource(p.quoteSource), [p.quoteSource]);
  const edit = (patch: Partial<TextPlacement>) =>
    editor.change((l) => mapPlacements(l, [p.id], (q) => (q.type === 'text' ? remeasured({ ...q, ...patch }, dpi) : q)));
  return (
    <section className="mb-4 space-y-1.5">
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Words</h3>
      <label className="block text-xs text-ink-soft">
        Text
        <textarea value={content} rows={2} maxLength={2000} onChange={(e) => setContent(e.target.value)}
          onBlur={() => content !== p.content && edit({ content })}
          className="mt-0.5 block w-full rounded border border-sand bg-white px-1.5 py-1 text-sm text-ink" />
      </label>
      <Select aria-label="Font" value={p.fontId} className="border-sand text-sm" options={SHIPPED_FONTS.map((f) => ({ value: f.id, label: f.name }))}
        onChange={(e) => edit({ fontId: e.target.value })} />
      <NumberField label="Size" value={p.sizePt} unit="pt" onCommit={(sizePt) => sizePt > 0 && sizePt <= 2000 && edit({ sizePt })} />
      <NumberField label="Spacing" value={p.letterSpacing} unit="‰" digits={0} onCommit={(letterSpacing) => letterSpacing >= -500 && letterSpacing <= 2000 && edit({ letterSpacing })} />
      <ArcField editor={editor} p={p} />
      <div className="flex items-center gap-2">
        <label className="flex items-center gap-2 text-xs text-ink-soft">
          Colour <input type="color" value={p.colour} onChange={(e) => edit({ colour: e.target.value })} />
        </label>
        <Select aria-label="Alignment" value={p.align} options={aligns} className="border-sand text-sm"
          onChange={(e) => edit({ align: e.target.value as TextPlacement['align'] })} />
      </div>
      <label className="flex items-center gap-2 text-xs text-ink-soft">
        <input type="checkbox" checked={p.isQuote} onChange={(e) => edit({ isQuote: e.target.checked })} />
        These are someone else’s words (a quote)
      </label>
      {p.isQuote && (
        <div className="text-xs text-ink-soft">
          <label className="block">
            Quoted from
            <input type="text" value={source} maxLength={300} placeholder="Who said or wrote it, and where"
              onChange={(e) => setSource(e.target.value)}
              onBlur={() => source !== p.quoteSource && edit({ quoteSource: source })}
              onKeyDown={(e) => e.key === 'Enter' && (e.target as HTMLInputElement).blur()}
              className="mt-0.5 block w-full rounded border border-sand bg-white px-1.5 py-1 text-sm text-ink" />
          </label>
          <p className="mt-0.5">Check that you may print it before you sell the product.</p>
        </div>
      )}
    </section>
  );
}
