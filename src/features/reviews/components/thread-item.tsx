import { useEffect, useRef, useState } from 'react';
import type { CommentThread } from '@shared/contracts/reviews';
import { anchorLabel } from '@shared/reviews/pins';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { classNames } from '../../../components/ui/class-names';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useCreateComment } from '../api/create-comment';
import { useResolveThread } from '../api/resolve-thread';
import { CommentForm } from './comment-form';

type ThreadItemProps = {
  thread: CommentThread;
  number: number;
  productRevision: number;
  selected: boolean;
  onSelect: () => void;
  canComment: boolean;
  canResolve: boolean;
};

const timeFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

// One thread: its comments (plain text, never HTML), a reply box, resolve or reopen.
export function ThreadItem({ thread, number, productRevision, selected, onSelect, canComment, canResolve }: ThreadItemProps) {
  const ref = useRef<HTMLLIElement>(null);
  const [replying, setReplying] = useState(false);
  const reply = useCreateComment({ mutationConfig: { onSuccess: () => setReplying(false) } });
  const resolve = useResolveThread();

  useEffect(() => {
    if (selected) ref.current?.scrollIntoView({ block: 'nearest', behavior: 'smooth' });
  }, [selected]);

  return (
    <li ref={ref} className={classNames('rounded-md border p-3', selected ? 'border-ochre bg-ochre/10' : 'border-sand bg-paper')}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <button type="button" onClick={onSelect} aria-pressed={selected} className="flex items-center gap-2 rounded-md text-left">
          <span aria-hidden="true" className={classNames('flex size-6 shrink-0 items-center justify-center rounded-full text-xs font-bold', thread.resolved ? 'bg-sand text-ink-soft' : 'bg-tide text-paper')}>{number}</span>
          <span className="text-sm text-ink-soft"><span className="sr-only">Comment {number}. </span>{anchorLabel(thread.anchor)}</span>
        </button>
        <div className="flex flex-wrap gap-1">
          {thread.resolved && <Badge tone="kelp">Resolved{thread.resolvedBy ? ` by ${thread.resolvedBy.name}` : ''}</Badge>}
          {thread.productRevision < productRevision && <Badge tone="ochre">on revision {thread.productRevision}</Badge>}
        </div>
      </div>
      <ol className="mt-2 flex flex-col gap-2">
        {thread.comments.map((comment) => (
          <li key={comment.id}>
            <p className="text-sm">
              <span className="font-semibold text-ink">{comment.author?.name ?? 'Former member'}</span>{' '}
              <time dateTime={comment.createdAt} className="text-ink-soft">{timeFormat.format(new Date(comment.createdAt))}</time>
            </p>
            <p className="break-words whitespace-pre-wrap text-ink">{comment.body}</p>
          </li>
        ))}
      </ol>
      <div className="mt-3 flex flex-col gap-2">
        {replying ? (
          <CommentForm
            label={`Reply to comment ${number}`}
            submitLabel="Reply"
            autoFocus
            busy={reply.isPending}
            error={reply.error}
            onSubmit={(body) => reply.mutateAsync({ productId: thread.productId, threadId: thread.id, body })}
            onCancel={() => setReplying(false)}
          />
        ) : (
          <div className="flex flex-wrap gap-2">
            {canComment && <Button size="sm" variant="secondary" onClick={() => setReplying(true)}>Reply</Button>}
            {canResolve && (
              <Button size="sm" variant="quiet" busy={resolve.isPending} onClick={() => resolve.mutate({ productId: thread.productId, threadId: thread.id, resolved: !thread.resolved })}>
                {thread.resolved ? 'Reopen' : 'Resolve'}
              </Button>
            )}
          </div>
        )}
        {resolve.isError && <p role="alert" className="text-sm font-semibold text-rust">{errorMessageOf(resolve.error)}</p>}
      </div>
    </li>
  );
}
