import type { CommentThread } from '@shared/contracts/reviews';
import { EmptyState } from '../../../components/ui/empty-state';
import { RadioGroup } from '../../../components/ui/radio-group';
import { ThreadItem } from './thread-item';

export type ThreadFilter = 'open' | 'resolved' | 'all';

type ThreadListProps = {
  threads: readonly CommentThread[];
  numbers: ReadonlyMap<string, number>;
  filter: ThreadFilter;
  onFilter: (filter: ThreadFilter) => void;
  productRevision: number;
  selectedId: string | null;
  onSelect: (threadId: string) => void;
  canComment: boolean;
  canResolve: boolean;
};

export function matchesFilter(thread: CommentThread, filter: ThreadFilter) {
  return filter === 'all' || (filter === 'resolved') === thread.resolved;
}

export function ThreadList({ threads, numbers, filter, onFilter, productRevision, selectedId, onSelect, canComment, canResolve }: ThreadListProps) {
  const open = threads.filter((t) => !t.resolved).length;
  const shown = threads.filter((t) => matchesFilter(t, filter));
  return (
    <div className="flex flex-col gap-3">
      <RadioGroup
        legend="Show"
        name="thread-filter"
        inline
        value={filter}
        onChange={onFilter}
        options={[
          { value: 'open', label: `Open (${open})` },
          { value: 'resolved', label: `Resolved (${threads.length - open})` },
          { value: 'all', label: `All (${threads.length})` },
        ]}
      />
      {shown.length === 0 ? (
        <EmptyState title={threads.length === 0 ? 'No comments yet' : filter === 'open' ? 'Nothing open' : 'Nothing here'}>
          {threads.length === 0 ? (canComment ? 'Click the preview to pin a comment to a spot, or leave a general comment.' : 'Comments on this product will show here.') : 'Choose another filter to see the other threads.'}
        </EmptyState>
      ) : (
        <ul className="flex max-h-[36rem] flex-col gap-3 overflow-y-auto pr-1">
          {shown.map((thread) => (
            <ThreadItem
              key={thread.id}
              thread={thread}
              number={numbers.get(thread.id) ?? 0}
              productRevision={productRevision}
              selected={thread.id === selectedId}
              onSelect={() => onSelect(thread.id)}
              canComment={canComment}
              canResolve={canResolve}
            />
          ))}
        </ul>
      )}
    </div>
  );
}
