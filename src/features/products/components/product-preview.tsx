import { useState } from 'react';
import type { ProductDetail } from '@shared/contracts/products';
import { WRAP_VIEWS } from '@shared/wrap/wrap-views';
import { classNames } from '../../../components/ui/class-names';
import { Select } from '../../../components/ui/select-field';
import { Spinner } from '../../../components/ui/spinner';

const viewLabels: Record<string, string> = { front: 'Front', back: 'Back', 'handle-left': 'Handle on the left', 'handle-right': 'Handle on the right', flat: 'Flat' };

// The product as it will look, rendered by the server from the saved layout (a mug from four sides).
export function ProductPreview({ product }: { product: ProductDetail }) {
  const views: readonly string[] = product.template.kind === 'mug-wrap' ? WRAP_VIEWS : ['flat'];
  const [view, setView] = useState(views[0]);
  const [blank, setBlank] = useState('');
  const [state, setState] = useState<'loading' | 'ready' | 'failed'>('loading');
  const query = new URLSearchParams({ r: String(product.revision) });
  if (blank) query.set('variant', blank);
  const src = `/api/products/${encodeURIComponent(product.id)}/previews/${view}.png?${query}`;
  const choose = (next: string) => {
    setView(next);
    setState('loading');
  };

  return (
    <figure className="flex flex-col gap-3">
      <div className="relative grid aspect-[4/3] place-items-center overflow-hidden rounded-lg border border-sand bg-shell">
        <img
          key={src}
          src={src}
          alt={`Preview of ${product.name}: ${viewLabels[view]}`}
          onLoad={() => setState('ready')}
          onError={() => setState('failed')}
          className={classNames('absolute inset-0 size-full object-contain p-2', state !== 'ready' && 'invisible')}
        />
        {state === 'loading' && <span className="absolute inset-0 grid place-items-center"><Spinner className="size-6" /><span className="sr-only">Rendering the preview…</span></span>}
        {state === 'failed' && <p className="absolute inset-0 grid place-items-center p-4 text-center text-ink-soft">The preview could not be rendered. Open the layout to check the product.</p>}
      </div>
      <figcaption className="flex flex-wrap items-center gap-2">
        {views.length > 1 && (
          <div role="group" aria-label="Preview side" className="flex flex-wrap gap-1">
            {views.map((v) => (
              <button key={v} type="button" aria-pressed={v === view} onClick={() => choose(v)} className={classNames('min-h-8 rounded-md border px-2.5 text-sm', v === view ? 'border-tide bg-tide/10 font-semibold text-tide-deep' : 'border-sand text-ink hover:border-tide')}>
                {viewLabels[v]}
              </button>
            ))}
          </div>
        )}
        {product.template.variants.length > 0 && (
          <label className="ml-auto flex items-center gap-2 text-sm">
            Blank
            <Select
              aria-label="Blank shown in the preview"
              value={blank}
              onChange={(e) => { setBlank(e.target.value); setState('loading'); }}
              options={[{ value: '', label: 'Plain blank' }, ...product.template.variants.map((v) => ({ value: v.id, label: v.name }))]}
              className="border-sand py-1 text-sm"
            />
          </label>
        )}
      </figcaption>
    </figure>
  );
}
