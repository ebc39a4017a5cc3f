import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import { ButtonLink } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { ProductReviewSection } from '../../reviews/components/product-review-section';
import { ProductSamplesSection } from '../../samples/components/product-samples-section';
import { productQueryOptions } from '../api/get-product';
import { ProductDetailsPanel } from '../components/product-details-panel';
import { ProductExports } from '../components/product-exports';
import { ProductMotifs } from '../components/product-motifs';
import { ProductPreview } from '../components/product-preview';
import { ProductVariants } from '../components/product-variants';
import { StagePanel } from '../components/stage-panel';

// The product's own page: how it looks, what it is sold as, where it is on its path, and who
// said what about it. The layout editor is one link away.
export function ProductPage() {
  const { productId = '' } = useParams();
  const me = useSession();
  // The editor keeps this query fresh itself; this page may refetch it (another tab's changes).
  const product = useQuery({ ...productQueryOptions(productId), staleTime: 30_000, refetchOnWindowFocus: true });

  if (product.isPending) return <><PageHeader title="Product" /><LoadingState /></>;
  if (product.isError) return <><PageHeader title="Product" /><ErrorState error={product.error} onRetry={() => void product.refetch()} /></>;
  const p = product.data;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={p.name}
        description={`${p.template.name}${p.collectionName ? ` · ${p.collectionName}` : ''}`}
        actions={<ButtonLink to={`/products/${p.id}/layout`}>{can(me.role, 'products.compose') ? 'Open the layout' : 'See the layout'}</ButtonLink>}
      />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex flex-col gap-6">
          <Card title="Preview"><ProductPreview product={p} /></Card>
          <Card title="Variants and SKUs"><ProductVariants product={p} canEdit={can(me.role, 'stages.move')} /></Card>
          <Card title="Motifs used"><ProductMotifs motifs={p.motifs} /></Card>
        </div>
        <div className="flex flex-col gap-6">
          <Card title="Stage"><StagePanel product={p} canMove={can(me.role, 'stages.move')} canOverride={can(me.role, 'stages.override')} /></Card>
          <Card title="Details">
            <p className="mb-3 text-sm text-ink-soft">Template: {p.template.name} · revision {p.revision} · {p.placementCount} placements</p>
            <ProductDetailsPanel key={p.id} product={p} canEdit={can(me.role, 'products.compose')} />
          </Card>
          <Card title="Print files"><ProductExports product={p} canExport={can(me.role, 'exports.create')} /></Card>
        </div>
      </div>
      <ProductSamplesSection product={p} />
      <ProductReviewSection product={p} />
    </div>
  );
}
