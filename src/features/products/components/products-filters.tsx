import type { ProductSummary } from '@shared/contracts/products';
import { productStages } from '@shared/contracts/stages';
import { SelectField } from '../../../components/ui/select-field';
import { stageLabels } from './stage-labels';

export type ProductFilters = { stage: string; collection: string; template: string; tag: string };
export const filterKeys = ['stage', 'collection', 'template', 'tag'] as const;

export function applyProductFilters(products: ProductSummary[], f: ProductFilters): ProductSummary[] {
  return products.filter(
    (p) =>
      (!f.stage || p.stage === f.stage) &&
      (!f.collection || (f.collection === 'none' ? p.collectionId === null : p.collectionId === f.collection)) &&
      (!f.template || p.templateId === f.template) &&
      (!f.tag || p.tags.includes(f.tag)),
  );
}

const uniqueBy = <T,>(items: T[], key: (t: T) => string) => [...new Map(items.map((i) => [key(i), i])).values()];

// The choices come from the products themselves, so no filter offers an option that finds nothing.
export function ProductFiltersBar({ products, filters, onChange, showStage }: { products: ProductSummary[]; filters: ProductFilters; onChange: (f: ProductFilters) => void; showStage: boolean }) {
  const set = (key: keyof ProductFilters) => (e: { target: { value: string } }) => onChange({ ...filters, [key]: e.target.value });
  const collections = uniqueBy(products.filter((p) => p.collectionId), (p) => p.collectionId!).map((p) => ({ value: p.collectionId!, label: p.collectionName ?? 'Unnamed collection' }));
  const templates = uniqueBy(products, (p) => p.templateId).map((p) => ({ value: p.templateId, label: p.templateName }));
  const tags = [...new Set(products.flatMap((p) => p.tags))].sort().map((t) => ({ value: t, label: t }));
  return (
    <div className="flex flex-wrap items-end gap-3" role="group" aria-label="Filter products">
      {showStage && (
        <div className="w-40"><SelectField label="Stage" name="stage" value={filters.stage} onChange={set('stage')} options={[{ value: '', label: 'Any stage' }, ...productStages.map((s) => ({ value: s, label: stageLabels[s] }))]} /></div>
      )}
      <div className="w-48"><SelectField label="Collection" name="collection" value={filters.collection} onChange={set('collection')} options={[{ value: '', label: 'Any collection' }, { value: 'none', label: 'No collection' }, ...collections]} /></div>
      <div className="w-56"><SelectField label="Template" name="template" value={filters.template} onChange={set('template')} options={[{ value: '', label: 'Any template' }, ...templates]} /></div>
      <div className="w-40"><SelectField label="Tag" name="tag" value={filters.tag} onChange={set('tag')} options={[{ value: '', label: 'Any tag' }, ...tags]} /></div>
    </div>
  );
}
