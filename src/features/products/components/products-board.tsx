import { useState, type DragEvent } from 'react';
import { Link } from 'react-router-dom';
import type { ProductSummary } from '@shared/contracts/products';
import { productStages, type ProductStage } from '@shared/contracts/stages';
import { isMoveAllowed, stagesReachableFrom } from '@shared/stages/stage-rules';
import { classNames } from '../../../components/ui/class-names';
import { Menu } from '../../../components/ui/menu';
import { StageMoveDialog, type StageMoveTarget } from './stage-move-dialog';
import { stageLabels, verdictLabels } from './stage-labels';

type Props = { products: ProductSummary[]; canMove: boolean; canOverride: boolean };

const dragType = 'application/x-motifold-product';

// Products in columns by stage. A card moves by dragging it to another column, or from the
// keyboard with its "Move to…" menu; either way a note is asked for before the move is sent.
export function ProductsBoard({ products, canMove, canOverride }: Props) {
  const [target, setTarget] = useState<StageMoveTarget | null>(null);
  const [dragging, setDragging] = useState<ProductSummary | null>(null);
  const [over, setOver] = useState<ProductStage | null>(null);

  const drop = (stage: ProductStage) => (event: DragEvent) => {
    event.preventDefault();
    const id = event.dataTransfer.getData(dragType) || dragging?.id;
    const product = products.find((p) => p.id === id);
    setOver(null);
    setDragging(null);
    if (product && isMoveAllowed(product.stage, stage)) setTarget({ product, to: stage });
  };

  return (
    <>
      {/* seven columns that share the page's width, scrolling sideways only on narrow screens */}
      <div className="grid grid-cols-[repeat(7,minmax(9rem,1fr))] gap-2 overflow-x-auto pb-2 xl:overflow-visible" role="list" aria-label="Products by stage">
        {productStages.map((stage) => {
          const inStage = products.filter((p) => p.stage === stage);
          const accepts = dragging !== null && isMoveAllowed(dragging.stage, stage);
          return (
            <section
              key={stage}
              role="listitem"
              aria-labelledby={`board-${stage}`}
              onDragOver={(e) => {
                if (!accepts) return;
                e.preventDefault();
                e.dataTransfer.dropEffect = 'move';
                setOver(stage);
              }}
              onDragLeave={() => setOver((s) => (s === stage ? null : s))}
              onDrop={drop(stage)}
              className={classNames(
                'flex min-w-0 flex-col gap-2 rounded-lg border bg-shell p-1.5',
                over === stage ? 'border-tide bg-tide/8' : accepts ? 'border-dashed border-tide/60' : 'border-sand',
              )}
            >
              <h3 id={`board-${stage}`} className="flex items-baseline justify-between px-1 font-semibold text-ink">
                {stageLabels[stage]}
                <span className="text-sm font-normal text-ink-soft tabular-nums">{inStage.length}</span>
              </h3>
              <ul className="flex min-h-16 flex-col gap-2" aria-label={`${stageLabels[stage]}: ${inStage.length} ${inStage.length === 1 ? 'product' : 'products'}`}>
                {inStage.map((p) => (
                  <BoardCard key={p.id} product={p} canMove={canMove} onDragStart={() => setDragging(p)} onDragEnd={() => { setDragging(null); setOver(null); }} onMoveTo={(to) => setTarget({ product: p, to })} />
                ))}
              </ul>
            </section>
          );
        })}
      </div>
      <StageMoveDialog target={target} onClose={() => setTarget(null)} canOverride={canOverride} />
    </>
  );
}

type CardProps = { product: ProductSummary; canMove: boolean; onDragStart: () => void; onDragEnd: () => void; onMoveTo: (to: ProductStage) => void };

function BoardCard({ product, canMove, onDragStart, onDragEnd, onMoveTo }: CardProps) {
  const items = stagesReachableFrom(product.stage).map((to) => ({ id: to, label: stageLabels[to], onSelect: () => onMoveTo(to) }));
  return (
    <li
      draggable={canMove}
      onDragStart={(e) => {
        e.dataTransfer.setData(dragType, product.id);
        e.dataTransfer.effectAllowed = 'move';
        onDragStart();
      }}
      onDragEnd={onDragEnd}
      className={classNames('flex flex-col gap-1 rounded-md border border-sand bg-paper p-2.5 shadow-paper', canMove && 'cursor-grab active:cursor-grabbing')}
    >
      <Link to={`/products/${product.id}`} className="font-semibold break-words text-tide-deep hover:underline">
        {product.name}
      </Link>
      <p className="text-sm text-ink-soft">{product.templateName}{product.collectionName ? ` · ${product.collectionName}` : ''}</p>
      {product.latestSampleVerdict && (
        <p className={classNames('self-start rounded border px-1.5 text-xs font-semibold text-ink', product.latestSampleVerdict === 'approved' ? 'border-kelp/50 bg-kelp/12' : 'border-ochre/60 bg-ochre/15')}>
          {verdictLabels[product.latestSampleVerdict]}
        </p>
      )}
      <div className="flex justify-end">
        {canMove && (
          <Menu trigger={<span className="text-sm">Move to…</span>} triggerLabel={`Move “${product.name}” to another stage`} items={items} triggerClassName="min-h-8 text-sm" />
        )}
      </div>
    </li>
  );
}
