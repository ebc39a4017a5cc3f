import { useCallback } from 'react';
import { useParams } from 'react-router-dom';
import { useQueryClient } from '@tanstack/react-query';
import type { Layout } from '@shared/scene';
import { ButtonLink } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { PageHeader } from '../../../components/ui/page-header';
import { ProductEditorView } from '../../compositor/components/product-editor';
import { getProduct, productQueryOptions, useProduct } from '../api/get-product';
import { productsKeys } from '../api/products-keys';
import { updateProduct } from '../api/update-product';

export function ProductEditorPage() {
  const { productId = '' } = useParams();
  const product = useProduct(productId);
  const queryClient = useQueryClient();

  const save = useCallback(async (layout: Layout, revision: number) => {
    const saved = await updateProduct({ id: productId, revision, layout });
    queryClient.setQueryData(productsKeys.detail(productId), saved);
    void queryClient.invalidateQueries({ queryKey: productsKeys.lists() });
    return { revision: saved.revision };
  }, [productId, queryClient]);

  const reload = useCallback(async () => {
    const fresh = await getProduct({ id: productId });
    queryClient.setQueryData(productQueryOptions(productId).queryKey, fresh);
    return fresh;
  }, [productId, queryClient]);

  if (product.isPending) return <><PageHeader title="Product" /><LoadingState /></>;
  if (product.isError) return <><PageHeader title="Product" /><ErrorState error={product.error} onRetry={() => void product.refetch()} /></>;
  const p = product.data;
  return (
    <div>
      <PageHeader
        title={p.name}
        actions={
          <span className="flex flex-wrap items-center gap-3">
            <span className="text-sm text-ink-soft">{`${p.templateName} · ${p.stage}`}</span>
            <ButtonLink variant="secondary" size="sm" to={`/products/${p.id}`}>The product’s page</ButtonLink>
          </span>
        }
      />
      {/* keyed by id, so moving to another product starts a fresh editor and autosave */}
      <ProductEditorView key={p.id} product={p} save={save} reload={reload} />
    </div>
  );
}
