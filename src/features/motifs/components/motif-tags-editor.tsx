import { useEffect, useState } from 'react';
import type { MotifDetail } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useTags } from '../../library/api/get-tags';
import { TagInput } from '../../library/components/tag-input';
import { useUpdateMotif } from '../api/update-motif';

const sameTags = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((t, i) => t === b[i]);

export function MotifTagsEditor({ motif }: { motif: MotifDetail }) {
  const [tags, setTags] = useState<string[]>(motif.tags);
  const [saved, setSaved] = useState(false);
  const allTags = useTags();
  const update = useUpdateMotif({ mutationConfig: { onSuccess: () => setSaved(true) } });
  useEffect(() => setTags(motif.tags), [motif.tags]);
  const changed = !sameTags(tags, motif.tags);
  const suggested = motif.suggestedTags.filter((t) => !tags.includes(t));

  return (
    <div className="flex flex-col gap-3">
      <TagInput
        label="Tags"
        hideLabel
        hint="Type to pick a tag the studio already uses, or a new one; Enter or a comma adds it."
        tags={tags}
        onChange={(next) => {
          setSaved(false);
          setTags(next);
        }}
        suggestions={(allTags.data?.tags ?? []).map((t) => ({ tag: t.tag, count: t.count }))}
      />
      {suggested.length > 0 && (
        <div className="flex flex-wrap items-center gap-1.5 text-sm">
          <span className="text-ink-soft">From the layer names:</span>
          {suggested.map((tag) => (
            <button
              key={tag}
              type="button"
              onClick={() => setTags([...tags, tag])}
              className="rounded-full border border-dashed border-tide/50 px-2.5 py-0.5 text-tide-deep hover:bg-tide/10"
              aria-label={`Add suggested tag ${tag}`}
            >
              + {tag}
            </button>
          ))}
        </div>
      )}
      <div className="flex flex-wrap items-center gap-2">
        <Button size="sm" disabled={!changed} busy={update.isPending} busyLabel="Saving…" onClick={() => update.mutate({ id: motif.id, changes: { tags } })}>
          Save tags
        </Button>
        {changed && (
          <Button size="sm" variant="quiet" onClick={() => setTags(motif.tags)}>
            Undo changes
          </Button>
        )}
        {saved && !changed && <span role="status" className="text-sm text-ink-soft">Tags saved.</span>}
      </div>
      {update.isError && <StatusMessage tone="problem">{errorMessageOf(update.error)}</StatusMessage>}
    </div>
  );
}
