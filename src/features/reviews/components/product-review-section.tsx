import { useEffect, useMemo, useRef, useState } from 'react';
import { useLocation, useSearchParams } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import type { PreviewView } from '@shared/contracts/exports';
import type { ProductDetail } from '@shared/contracts/products';
import { pinNumbers, previewViewsFor } from '@shared/reviews/pins';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { RadioGroup } from '../../../components/ui/radio-group';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { useCreateThread } from '../api/create-thread';
import { useReview } from '../api/get-review';
import { useThreads } from '../api/get-threads';
import { CommentForm } from './comment-form';
import { PreviewPinBoard, type DraftPin } from './preview-pin-board';
import { ReviewStatePanel } from './review-state-panel';
import { matchesFilter, ThreadList, type ThreadFilter } from './thread-list';

const viewLabels: Record<PreviewView, string> = { front: 'Front', 'handle-right': 'Handle right', back: 'Back', 'handle-left': 'Handle left', flat: 'Flat' };

// The product page's review: pinned comment threads on its preview, and its approval.
export function ProductReviewSection({ product }: { product: ProductDetail }) {
  const me = useSession();
  const canComment = can(me.role, 'reviews.comment');
  const canResolve = can(me.role, 'reviews.resolve');
  const canDecide = can(me.role, 'reviews.decide');
  const threads = useThreads(product.id);
  const review = useReview(product.id);
  const views = previewViewsFor(product.template);
  const [params] = useSearchParams();
  const [view, setView] = useState<PreviewView>(views[0]!);
  const [selectedId, setSelectedId] = useState<string | null>(params.get('thread'));
  const [filter, setFilter] = useState<ThreadFilter>('open');
  const [draft, setDraft] = useState<DraftPin | null>(null);
  const [general, setGeneral] = useState(false);
  const create = useCreateThread({ mutationConfig: { onSuccess: (thread) => { setDraft(null); setGeneral(false); setSelectedId(thread.id); } } });

  const all = useMemo(() => threads.data?.threads ?? [], [threads.data]);
  const numbers = useMemo(() => pinNumbers(all), [all]);
  const shown = all.filter((t) => matchesFilter(t, filter));

  const select = (threadId: string) => {
    setSelectedId(threadId);
    const thread = all.find((t) => t.id === threadId);
    if (!thread) return;
    if (thread.anchor?.surface === 'preview' && thread.anchor.view !== view) setView(thread.anchor.view);
    if (!matchesFilter(thread, filter)) setFilter('all');
  };
  const startDraft = (next: DraftPin | null) => {
    setGeneral(false);
    setDraft(next);
  };
  const composing = general || draft?.placed;

  // A link from a notification (?thread=… or #review) lands on what it is about, once.
  const location = useLocation();
  const sectionRef = useRef<HTMLDivElement>(null);
  const landed = useRef(false);
  useEffect(() => {
    if (landed.current || !threads.data) return;
    landed.current = true;
    const linked = params.get('thread');
    if (linked && all.some((t) => t.id === linked)) select(linked);
    else if (location.hash === '#review') sectionRef.current?.scrollIntoView({ block: 'start' });
    // runs when the threads first arrive; later refetches must not move the reader
  }, [threads.data]);

  return (
    <div id="review" ref={sectionRef} className="scroll-mt-4">
      <Card title="Review and comments" description={`${all.filter((t) => !t.resolved).length} open of ${all.length} threads`}>
        <div className="mb-5">
          {review.isPending ? <LoadingState label="Loading the review…" /> : review.isError ? (
            <ErrorState error={review.error} title="The review state could not be loaded" onRetry={() => void review.refetch()} />
          ) : (
            <ReviewStatePanel productId={product.id} review={review.data} myId={me.user.id} canAsk={canResolve} canDecide={canDecide} />
          )}
        </div>
        {threads.isPending ? <LoadingState label="Loading comments…" /> : threads.isError ? (
          <ErrorState error={threads.error} title="The comments could not be loaded" onRetry={() => void threads.refetch()} />
        ) : (
          <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
            <div className="flex flex-col gap-3">
              {views.length > 1 && (
                <RadioGroup legend="View" name="review-view" inline value={view} onChange={(v) => { setView(v); setDraft(null); }} options={views.map((v) => ({ value: v, label: viewLabels[v] }))} />
              )}
              <PreviewPinBoard
                productId={product.id}
                revision={product.revision}
                view={view}
                threads={shown}
                numbers={numbers}
                selectedId={selectedId}
                onSelect={select}
                draft={draft}
                onDraft={startDraft}
                canComment={canComment}
              />
              {canComment && !composing && <Button size="sm" variant="quiet" className="self-start" onClick={() => { setDraft(null); setGeneral(true); }}>General comment</Button>}
              {composing && (
                <CommentForm
                  label={general ? 'General comment on the product' : `Comment at the new pin (${viewLabels[view].toLowerCase()} view)`}
                  submitLabel="Post comment"
                  autoFocus
                  busy={create.isPending}
                  error={create.error}
                  onSubmit={(body) => create.mutateAsync({ productId: product.id, body, anchor: draft && !general ? { surface: 'preview', view, x: draft.point.x, y: draft.point.y } : null })}
                  onCancel={() => { setDraft(null); setGeneral(false); }}
                />
              )}
            </div>
            <ThreadList
              threads={all}
              numbers={numbers}
              filter={filter}
              onFilter={setFilter}
              productRevision={product.revision}
              selectedId={selectedId}
              onSelect={select}
              canComment={canComment}
              canResolve={canResolve}
            />
          </div>
        )}
      </Card>
    </div>
  );
}
