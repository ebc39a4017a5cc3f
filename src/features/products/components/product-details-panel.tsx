import { useId, useState, type FormEvent } from 'react';
import type { ProductDetail } from '@shared/contracts/products';
import { Button } from '../../../components/ui/button';
import { controlClasses } from '../../../components/ui/field-parts';
import { SelectField } from '../../../components/ui/select-field';
import { StatusMessage } from '../../../components/ui/status-message';
import { useCollections } from '../../collections/api/get-collections';
import { TagInput } from '../../library/components/tag-input';
import { useProducts } from '../api/get-products';
import { useUpdateProductDetails } from '../api/update-product-details';

type Draft = { collectionId: string; tags: string[]; notes: string };
const draftOf = (p: ProductDetail): Draft => ({ collectionId: p.collectionId ?? '', tags: p.tags, notes: p.notes });

// Collection, tags and notes: saved on their own, without touching the layout's revision.
// A reviewer reads them as plain text rather than as a form they cannot use.
export function ProductDetailsPanel({ product, canEdit }: { product: ProductDetail; canEdit: boolean }) {
  return canEdit ? <DetailsForm product={product} /> : <DetailsReadOnly product={product} />;
}

function DetailsReadOnly({ product }: { product: ProductDetail }) {
  const collections = useCollections();
  const collection = collections.data?.collections.find((c) => c.id === product.collectionId);
  const none = <span className="text-ink-soft">None</span>;
  return (
    <dl aria-label="Product details" className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2">
      <dt className="font-semibold">Collection</dt>
      <dd>{product.collectionId ? (collection?.name ?? (collections.isPending ? '…' : 'A removed collection')) : none}</dd>
      <dt className="font-semibold">Tags</dt>
      <dd>
        {product.tags.length === 0 ? none : (
          <ul className="flex flex-wrap gap-1.5" aria-label="Tags">
            {product.tags.map((t) => <li key={t} className="rounded border border-sand bg-shell px-1.5 text-sm">{t}</li>)}
          </ul>
        )}
      </dd>
      <dt className="font-semibold">Notes</dt>
      <dd className="whitespace-pre-wrap break-words">{product.notes.trim() === '' ? none : product.notes}</dd>
      <dd className="col-span-2 text-sm text-ink-soft">Owners and editors change these details.</dd>
    </dl>
  );
}

function DetailsForm({ product }: { product: ProductDetail }) {
  const notesId = useId();
  const collections = useCollections();
  const products = useProducts();
  const [draft, setDraft] = useState<Draft>(() => draftOf(product));
  const [saved, setSaved] = useState(false);
  const save = useUpdateProductDetails({ mutationConfig: { onSuccess: (p) => { setDraft(draftOf(p)); setSaved(true); } } });
  const dirty = JSON.stringify(draft) !== JSON.stringify(draftOf(product));
  const suggestions = [...new Set((products.data?.products ?? []).flatMap((p) => p.tags))].map((tag) => ({ tag }));
  const options = [{ value: '', label: 'No collection' }, ...(collections.data?.collections ?? []).map((c) => ({ value: c.id, label: c.name }))];

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setSaved(false);
    save.mutate({ id: product.id, collectionId: draft.collectionId || null, tags: draft.tags, notes: draft.notes });
  };
  const change = (next: Partial<Draft>) => {
    setSaved(false);
    setDraft({ ...draft, ...next });
  };

  return (
    <form onSubmit={submit} aria-label="Product details" className="flex flex-col gap-4">
      <SelectField label="Collection" name="collectionId" value={draft.collectionId} onChange={(e) => change({ collectionId: e.target.value })} options={options} disabled={!collections.isSuccess} hint={collections.isError ? 'The collections could not be loaded.' : undefined} error={save.error?.fields?.collectionId} />
      <TagInput label="Tags" tags={draft.tags} onChange={(tags) => change({ tags: tags.map((t) => t.toLowerCase()) })} suggestions={suggestions} placeholder="gift, bestseller…" />
      <div className="flex flex-col gap-1.5">
        <label htmlFor={notesId} className="font-semibold">Notes</label>
        <textarea id={notesId} value={draft.notes} onChange={(e) => change({ notes: e.target.value })} rows={4} maxLength={20_000} className={`${controlClasses} border-sand`} />
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" busy={save.isPending} disabled={!dirty}>Save details</Button>
        {saved && !dirty && <span role="status" className="text-sm text-ink-soft">Saved.</span>}
      </div>
      {save.isError && !save.error.fields && <StatusMessage tone="problem" title="The details were not saved">{save.error.message} Your changes are still here.</StatusMessage>}
    </form>
  );
}
