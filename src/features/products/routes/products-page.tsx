import { useState, type FormEvent } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { SelectField } from '../../../components/ui/select-field';
import { LoadingState } from '../../../components/ui/spinner';
import { TextField } from '../../../components/ui/text-field';
import { useSession } from '../../auth/components/session';
import { useCreateProduct } from '../api/create-product';
import { useProducts } from '../api/get-products';
import { useTemplates } from '../api/get-templates';
import { ProductsBoard } from '../components/products-board';
import { applyProductFilters, filterKeys, ProductFiltersBar, type ProductFilters } from '../components/products-filters';
import { ProductsTable } from '../components/products-table';
import { ViewToggle, type ProductsView } from '../components/view-toggle';

export function ProductsPage() {
  const me = useSession();
  const products = useProducts();
  const [params, setParams] = useSearchParams();
  const view: ProductsView = params.get('view') === 'board' ? 'board' : 'table';
  const filters = Object.fromEntries(filterKeys.map((k) => [k, params.get(k) ?? ''])) as ProductFilters;

  // The view and the filters live in the address, so a reload or a shared link shows the same.
  const update = (next: { view?: ProductsView; filters?: ProductFilters }) => {
    const out = new URLSearchParams();
    const v = next.view ?? view;
    if (v === 'board') out.set('view', 'board');
    const f = next.filters ?? filters;
    for (const k of filterKeys) if (f[k] && !(v === 'board' && k === 'stage')) out.set(k, f[k]);
    setParams(out, { replace: true });
  };

  return (
    <div>
      <PageHeader title="Products" description="What your studio sells: a template, a layout of motifs, its variants and its stage." />
      {can(me.role, 'products.compose') && <NewProductForm />}
      <div className="mt-8 mb-3 flex flex-wrap items-end justify-between gap-3">
        <h2 className="text-xl font-semibold text-ink">Your products</h2>
        <ViewToggle view={view} onChange={(v) => update({ view: v })} />
      </div>
      {products.isPending && <LoadingState />}
      {products.isError && <ErrorState error={products.error} onRetry={() => void products.refetch()} />}
      {products.isSuccess && products.data.products.length === 0 && (
        <EmptyState title="No products yet">{can(me.role, 'products.compose') ? 'Choose a template above to start one.' : 'An owner or editor starts products; they show here.'}</EmptyState>
      )}
      {products.isSuccess && products.data.products.length > 0 && (
        <div className="flex flex-col gap-4">
          <ProductFiltersBar products={products.data.products} filters={filters} onChange={(f) => update({ filters: f })} showStage={view === 'table'} />
          <FilteredProducts view={view} all={products.data.products} filters={filters} canMove={can(me.role, 'stages.move')} canOverride={can(me.role, 'stages.override')} onClear={() => update({ filters: { stage: '', collection: '', template: '', tag: '' } })} />
        </div>
      )}
    </div>
  );
}

type FilteredProps = { view: ProductsView; all: Parameters<typeof applyProductFilters>[0]; filters: ProductFilters; canMove: boolean; canOverride: boolean; onClear: () => void };

function FilteredProducts({ view, all, filters, canMove, canOverride, onClear }: FilteredProps) {
  const shown = applyProductFilters(all, view === 'board' ? { ...filters, stage: '' } : filters);
  if (shown.length === 0) {
    return <EmptyState title="No product matches these filters" action={<Button variant="secondary" onClick={onClear}>Clear the filters</Button>}>Try another stage, collection, template or tag.</EmptyState>;
  }
  return view === 'board' ? <ProductsBoard products={shown} canMove={canMove} canOverride={canOverride} /> : <ProductsTable products={shown} />;
}

function NewProductForm() {
  const templates = useTemplates();
  const navigate = useNavigate();
  // A new product is empty: straight to its layout.
  const create = useCreateProduct({ mutationConfig: { onSuccess: (product) => navigate(`/products/${product.id}/layout`) } });
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
