import { useState } from 'react';
import { can } from '@shared/auth/permissions';
import type { ProductDetail } from '@shared/contracts/products';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { useProductSamples } from '../api/get-product-samples';
import { SampleCard } from './sample-card';
import { SampleForm } from './sample-form';

// The product page's samples: orders from the printer, their photos and the studio's verdict.
// The latest order (by date ordered) is the one that lets the product move to "ready".
export function ProductSamplesSection({ product }: { product: ProductDetail }) {
  const me = useSession();
  const canRecord = can(me.role, 'samples.record');
  const samples = useProductSamples(product.id);
  const [recording, setRecording] = useState(false);
  const list = samples.data?.samples ?? [];

  return (
    <Card
      title="Samples"
      description="Orders from the printer, photos of what arrived, and the verdict. The latest order’s approval lets the product move to ready."
      actions={
        canRecord && !recording && samples.isSuccess ? (
          <Button size="sm" onClick={() => setRecording(true)}>
            Record a sample order
          </Button>
        ) : undefined
      }
    >
      <div className="flex flex-col gap-4">
        {recording && (
          <SampleForm productId={product.id} defaultCurrency={list[0]?.currency ?? undefined} onDone={() => setRecording(false)} onCancel={() => setRecording(false)} />
        )}
        {samples.isPending && <LoadingState label="Loading samples…" />}
        {samples.isError && <ErrorState error={samples.error} title="The samples could not be loaded" onRetry={() => void samples.refetch()} retrying={samples.isFetching} />}
        {samples.isSuccess && list.length === 0 && !recording && (
          <EmptyState title="No sample ordered yet">
            {canRecord
              ? 'When you order a sample from the printer, record it here; its approval lets the product move to ready.'
              : 'Samples the studio orders from the printer will show here.'}
          </EmptyState>
        )}
        {samples.isSuccess &&
          list.map((sample) => (
            <SampleCard key={sample.id} sample={sample} latest={sample.id === samples.data.latestSample?.id} showLatest={list.length > 1} canRecord={canRecord} photoLimitBytes={samples.data.photoLimitBytes} />
          ))}
      </div>
    </Card>
  );
}
