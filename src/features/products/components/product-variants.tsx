import { useState, type FormEvent } from 'react';
import type { ProductDetail } from '@shared/contracts/products';
import type { ProductVariant } from '@shared/contracts/variants';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { SelectField } from '../../../components/ui/select-field';
import { LoadingState } from '../../../components/ui/spinner';
import { TextField } from '../../../components/ui/text-field';
import { useDeleteProductVariant } from '../api/delete-product-variant';
import { useProductVariants } from '../api/get-product-variants';
import { useSaveProductVariant } from '../api/save-product-variant';

type Draft = { name: string; sku: string; blank: string; size: string };
const draftOf = (v?: ProductVariant): Draft => ({ name: v?.name ?? '', sku: v?.sku ?? '', blank: v?.options.templateVariantId ?? '', size: v?.options.size ?? '' });
const changesOf = (d: Draft) => ({
  name: d.name.trim(),
  sku: d.sku.trim(),
  options: { ...(d.blank ? { templateVariantId: d.blank } : {}), ...(d.size.trim() ? { size: d.size.trim() } : {}) },
});

// What the product is sold as, one row per variant, each with its shop SKU.
export function ProductVariants({ product, canEdit }: { product: ProductDetail; canEdit: boolean }) {
  const variants = useProductVariants(product.id);
  const blanks = [{ value: '', label: 'Plain blank' }, ...product.template.variants.map((v) => ({ value: v.id, label: v.name }))];
  if (variants.isPending) return <LoadingState />;
  if (variants.isError) return <ErrorState error={variants.error} onRetry={() => void variants.refetch()} />;
  return (
    <div className="flex flex-col gap-3">
      {variants.data.variants.length === 0 && <EmptyState title="No variants yet">{canEdit ? 'Add one for each blank colour or size you sell, with its SKU from your shop.' : 'An owner or editor adds the variants and their SKUs.'}</EmptyState>}
      {variants.data.variants.map((v) => (canEdit ? <VariantForm key={v.id} productId={product.id} variant={v} blanks={blanks} /> : <VariantLine key={v.id} variant={v} blanks={blanks} />))}
      {canEdit && <VariantForm productId={product.id} blanks={blanks} />}
    </div>
  );
}

function VariantLine({ variant, blanks }: { variant: ProductVariant; blanks: { value: string; label: string }[] }) {
  const blank = blanks.find((b) => b.value === (variant.options.templateVariantId ?? ''))?.label;
  return (
    <p className="flex flex-wrap gap-x-3 rounded-md border border-sand/70 px-3 py-2">
      <span className="font-semibold">{variant.name}</span>
      <span className="font-mono text-sm">{variant.sku ?? 'no SKU yet'}</span>
      <span className="text-ink-soft">{[blank, variant.options.size].filter(Boolean).join(' · ')}</span>
    </p>
  );
}

function VariantForm({ productId, variant, blanks }: { productId: string; variant?: ProductVariant; blanks: { value: string; label: string }[] }) {
  const [draft, setDraft] = useState<Draft>(() => draftOf(variant));
  const save = useSaveProductVariant({ mutationConfig: { onSuccess: () => { if (!variant) setDraft(draftOf()); } } });
  const remove = useDeleteProductVariant();
  const set = (key: keyof Draft) => (e: { target: { value: string } }) => setDraft({ ...draft, [key]: e.target.value });
  const fields = save.error?.fields;
  const skuError = save.error?.code === 'variant.sku_taken' ? save.error.message : fields?.sku;
  const unchanged = variant && JSON.stringify(changesOf(draft)) === JSON.stringify(changesOf(draftOf(variant)));

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const changes = changesOf(draft);
    save.mutate(variant ? { productId, variantId: variant.id, changes } : { productId, changes });
  };

  return (
    <form onSubmit={submit} aria-label={variant ? `Variant ${variant.name}` : 'New variant'} className="flex flex-wrap items-end gap-3 rounded-md border border-sand/70 p-3">
      <div className="w-44"><TextField label="Variant" name="name" value={draft.name} onChange={set('name')} placeholder="Navy handle" required error={fields?.name} /></div>
      <div className="w-44"><TextField label="SKU" name="sku" value={draft.sku} onChange={set('sku')} placeholder="PUF-MUG-NVY" optional error={skuError} className="font-mono" /></div>
      {blanks.length > 1 && <div className="w-48"><SelectField label="Blank" name="blank" value={draft.blank} onChange={set('blank')} options={blanks} /></div>}
      <div className="w-28"><TextField label="Size" name="size" value={draft.size} onChange={set('size')} placeholder="11 oz" optional /></div>
      <div className="flex gap-2">
        <Button type="submit" size="sm" busy={save.isPending} disabled={unchanged || !draft.name.trim()}>{variant ? 'Save' : 'Add variant'}</Button>
        {variant && <Button size="sm" variant="quiet" busy={remove.isPending} onClick={() => remove.mutate({ productId, variantId: variant.id })}>Remove</Button>}
      </div>
      {save.isError && !skuError && !fields && <p role="alert" className="w-full text-sm text-rust">{save.error.message}</p>}
      {remove.isError && <p role="alert" className="w-full text-sm text-rust">{remove.error.message}</p>}
    </form>
  );
}
