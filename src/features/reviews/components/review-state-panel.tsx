import { useState } from 'react';
import type { ProductReview } from '@shared/contracts/reviews';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { formatDay } from '../../../lib/format';
import { useCreateDecision } from '../api/create-decision';
import { useCreateReviewRequest } from '../api/create-review-request';
import { CommentForm } from './comment-form';

type ReviewStatePanelProps = { productId: string; review: ProductReview; myId: string; canAsk: boolean; canDecide: boolean };

const statusWords: Record<ProductReview['state']['status'], { label: string; tone: BadgeTone }> = {
  none: { label: 'Not asked for review', tone: 'neutral' },
  requested: { label: 'Waiting for review', tone: 'tide' },
  approved: { label: 'Approved', tone: 'kelp' },
  changes_requested: { label: 'Changes asked for', tone: 'rust' },
};

function StateLine({ review }: { review: ProductReview }) {
  const { state, decisions, revision } = review;
  const older = !state.decision && decisions[0] && decisions[0].productRevision < revision ? decisions[0] : null;
  return (
    <div className="flex flex-col gap-1">
      <p className="flex flex-wrap items-center gap-2">
        <Badge tone={statusWords[state.status].tone}>{statusWords[state.status].label}</Badge>
        {state.decision && <span className="text-sm text-ink-soft">by {state.decision.reviewer?.name ?? 'a former member'} on {formatDay(state.decision.createdAt)}</span>}
        {state.openRequest && (
          <span className="text-sm text-ink-soft">
            {state.openRequest.requestedBy?.name ?? 'Someone'} asked {state.openRequest.reviewer?.name ?? 'the reviewers'} on {formatDay(state.openRequest.createdAt)}
          </span>
        )}
      </p>
      {(state.decision?.note || state.openRequest?.note) && <p className="whitespace-pre-wrap text-ink">{state.decision?.note || state.openRequest?.note}</p>}
      {older && (
        <p className="text-sm text-ink-soft">
          {older.reviewer?.name ?? 'A reviewer'} {older.decision === 'approved' ? 'approved' : 'asked for changes to'} revision {older.productRevision}; the layout has changed since (now revision {revision}).
        </p>
      )}
    </div>
  );
}

// Where the product's review stands, and the buttons of those who may move it on.
export function ReviewStatePanel({ productId, review, myId, canAsk, canDecide }: ReviewStatePanelProps) {
  const [mode, setMode] = useState<'idle' | 'ask' | 'changes'>('idle');
  const [reviewerId, setReviewerId] = useState('');
  const ask = useCreateReviewRequest({ mutationConfig: { onSuccess: () => setMode('idle') } });
  const decide = useCreateDecision({ mutationConfig: { onSuccess: () => setMode('idle') } });
  const others = review.reviewers.filter((r) => r.id !== myId);

  return (
    <div className="flex flex-col gap-3">
      <StateLine review={review} />
      {mode === 'idle' && (canAsk || canDecide) && (
        <div className="flex flex-wrap gap-2">
          {canAsk && <Button size="sm" variant="secondary" onClick={() => setMode('ask')}>Ask for review</Button>}
          {canDecide && (
            <>
              <Button size="sm" busy={decide.isPending} onClick={() => decide.mutate({ productId, decision: 'approved', note: '' })}>Approve</Button>
              <Button size="sm" variant="secondary" onClick={() => setMode('changes')}>Ask for changes</Button>
            </>
          )}
        </div>
      )}
      {mode === 'idle' && decide.isError && <p role="alert" className="text-sm font-semibold text-rust">{decide.error.message}</p>}
      {mode === 'ask' && (
        <div className="flex flex-col gap-3 rounded-md border border-sand bg-shell/60 p-3">
          <SelectField
            label="Who should review it?"
            name="reviewer"
            value={reviewerId}
            onChange={(e) => setReviewerId(e.target.value)}
            options={[{ value: '', label: 'Every reviewer of the studio' }, ...others.map((r) => ({ value: r.id, label: r.name }))]}
            error={ask.error?.fields?.reviewerId}
          />
          <CommentForm
            label="Note for the reviewer (optional)"
            submitLabel="Send the request"
            required={false}
            maxLength={2000}
            busy={ask.isPending}
            error={ask.error}
            onSubmit={(note) => ask.mutateAsync({ productId, reviewerId: reviewerId || null, note })}
            onCancel={() => setMode('idle')}
          />
        </div>
      )}
      {mode === 'changes' && (
        <div className="rounded-md border border-sand bg-shell/60 p-3">
          <CommentForm
            label="What should change?"
            submitLabel="Ask for changes"
            autoFocus
            maxLength={2000}
            busy={decide.isPending}
            error={decide.error}
            onSubmit={(note) => decide.mutateAsync({ productId, decision: 'changes_requested', note })}
            onCancel={() => setMode('idle')}
          />
        </div>
      )}
    </div>
  );
}
