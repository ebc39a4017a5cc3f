import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { SelectField } from '../../../components/ui/select-field';
import { LoadingState } from '../../../components/ui/spinner';
import { TextField } from '../../../components/ui/text-field';
import { useCreateProduct } from '../api/create-product';
import { useProducts } from '../api/get-products';
import { useTemplates } from '../api/get-templates';

export function ProductsPage() {
  const products = useProducts();
  return (
    <div>
      <PageHeader title="Products" description="What your studio sells: a template, a layout of motifs, and its stage." />
      <NewProductForm />
      <h2 className="mt-8 mb-3 text-xl font-semibold text-ink">Your products</h2>
      {products.isPending && <LoadingState />}
      {products.isError && <ErrorState error={products.error} onRetry={() => void products.refetch()} />}
      {products.isSuccess && products.data.products.length === 0 && (
        <EmptyState title="No products yet">Choose a template above to start one.</EmptyState>
      )}
      {products.isSuccess && products.data.products.length > 0 && (
        <ul className="divide-y divide-sand rounded-lg border border-sand bg-paper">
          {products.data.products.map((p) => (
            <li key={p.id} className="flex items-center justify-between gap-4 px-4 py-3">
              <div className="min-w-0">
                <Link to={`/products/${p.id}`} className="font-semibold text-tide-deep hover:underline">{p.name}</Link>
                <p className="text-sm text-ink-soft">{p.templateName} · {p.stage} · {p.placementCount} placements · revision {p.revision}</p>
              </div>
              <Link to={`/products/${p.id}`} className="text-sm font-semibold text-tide-deep hover:underline">Open</Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function NewProductForm() {
  const templates = useTemplates();
  const navigate = useNavigate();
  const create = useCreateProduct({ mutationConfig: { onSuccess: (product) => navigate(`/products/${product.id}`) } });
  const [name, setName] = useState('');
  const [templateId, setTemplateId] = useState('');
  const options = (templates.data?.templates ?? []).map((t) => ({ value: t.template.id, label: t.template.name }));
  const chosen = templateId || options[0]?.value || '';

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!chosen) return;
    create.mutate({ name: name.trim() || 'Untitled product', templateId: chosen });
  };

  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3 rounded-lg border border-sand bg-paper p-4" aria-label="New product">
      <div className="w-64"><TextField label="Name" name="name" value={name} onChange={(e) => setName(e.target.value)} placeholder="Coastal Spring mug" /></div>
      <div className="w-72">
        <SelectField label="Template" name="templateId" value={chosen} onChange={(e) => setTemplateId(e.target.value)} options={options} disabled={!templates.isSuccess} />
      </div>
      <Button type="submit" busy={create.isPending} disabled={!chosen}>Start a product</Button>
      {create.isError && <p role="alert" className="w-full text-sm text-rust">{create.error.message}</p>}
    </form>
  );
}
