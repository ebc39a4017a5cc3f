import { useState } from 'react';
import type { ProductDetail } from '@shared/contracts/products';
import { stagesReachableFrom } from '@shared/stages/stage-rules';
import { Badge } from '../../../components/ui/badge';
import { ErrorState } from '../../../components/ui/error-state';
import { Menu } from '../../../components/ui/menu';
import { LoadingState } from '../../../components/ui/spinner';
import { useProductStages } from '../api/get-product-stages';
import { StageMoveDialog, type StageMoveTarget } from './stage-move-dialog';
import { stageLabels, stageTones } from './stage-labels';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

export function StagePanel({ product, canMove, canOverride }: { product: ProductDetail; canMove: boolean; canOverride: boolean }) {
  const history = useProductStages(product.id);
  const [target, setTarget] = useState<StageMoveTarget | null>(null);
  const items = stagesReachableFrom(product.stage).map((to) => ({ id: to, label: stageLabels[to], onSelect: () => setTarget({ product, to }) }));
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <Badge tone={stageTones[product.stage]} className="text-sm">{stageLabels[product.stage]}</Badge>
        {canMove && <Menu trigger="Move to…" triggerLabel="Move to another stage" items={items} align="start" triggerClassName="border border-sand" />}
      </div>
      <h3 className="font-semibold">Stage history</h3>
      {history.isPending && <LoadingState />}
      {history.isError && <ErrorState error={history.error} onRetry={() => void history.refetch()} />}
      {history.isSuccess && (
        <ol className="flex flex-col gap-2" aria-label="Stage history, oldest first">
          {history.data.moves.map((m) => (
            <li key={m.id} className="rounded-md border border-sand/70 px-3 py-2">
              <p>
                <span className="font-semibold">{m.fromStage ? `${stageLabels[m.fromStage]} → ${stageLabels[m.toStage]}` : `Started in ${stageLabels[m.toStage]}`}</span>
                {m.override && <Badge tone="rust" className="ml-2">Owner override: no approved sample</Badge>}
              </p>
              <p className="text-sm text-ink-soft">{m.movedBy?.name ?? 'Someone no longer in the studio'} · <time dateTime={m.createdAt}>{when.format(new Date(m.createdAt))}</time></p>
              {m.note && <p className="mt-1 whitespace-pre-wrap">{m.note}</p>}
            </li>
          ))}
        </ol>
      )}
      <StageMoveDialog target={target} onClose={() => setTarget(null)} canOverride={canOverride} />
    </div>
  );
}
