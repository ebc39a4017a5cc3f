import type { MotifFacets, RightsStatusDto } from '@shared/contracts/motifs';
import { rightsStatuses } from '@shared/contracts/motifs';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { RadioGroup } from '../../../components/ui/radio-group';
import { SelectField } from '../../../components/ui/select-field';
import { useCollections } from '../../collections/api/get-collections';
import { useOriginals } from '../../originals/api/get-originals';
import { useTags } from '../api/get-tags';
import { emptyLibraryQuery, type LibraryQuery } from '@shared/library/library-address';
import { rightsWords } from '../rights-words';
import { ColourFilter } from './colour-filter';
import { TagInput } from './tag-input';

type LibraryFiltersProps = {
  query: LibraryQuery;
  facets: MotifFacets | undefined;
  onChange: (change: Partial<LibraryQuery>) => void;
};

const counted = (label: string, count: number | undefined) => (count === undefined ? label : `${label} (${count})`);

// Every filter narrows the results further; the counts in brackets are within the current results.
export function LibraryFilters({ query, facets, onChange }: LibraryFiltersProps) {
  const tags = useTags();
  const collections = useCollections();
  const originals = useOriginals();
  const facetCount = (list: { id: string; count: number }[] | undefined, id: string) => list?.find((x) => x.id === id)?.count;
  const tagCounts = new Map(facets?.tags.map((t) => [t.tag, t.count]));
  const tagSuggestions = (tags.data?.tags ?? []).map((t) => ({ tag: t.tag, count: tagCounts.get(t.tag) ?? 0 }));

  const toggleRights = (status: RightsStatusDto, on: boolean) =>
    onChange({ rights: on ? [...query.rights, status] : query.rights.filter((r) => r !== status) });

  return (
    <div className="flex flex-col gap-6">
      <TagInput
        label="Tags"
        hint="Motifs carrying all of these tags."
        tags={query.tags}
        onChange={(next) => onChange({ tags: next })}
        suggestions={tagSuggestions}
        allowNew={false}
        placeholder="Type a tag"
      />
      <ColourFilter colour={query.colour} onChange={(colour) => onChange({ colour })} />
      <SelectField
        label="Collection"
        name="collection"
        value={query.collectionId ?? ''}
        onChange={(event) => onChange({ collectionId: event.target.value || null })}
        options={[
          { value: '', label: 'Any collection' },
          ...(collections.data?.collections ?? []).map((c) => ({
            value: c.id,
            label: counted(c.name, facetCount(facets?.collections, c.id) ?? 0),
          })),
        ]}
      />
      <SelectField
        label="Original"
        name="original"
        value={query.originalId ?? ''}
        onChange={(event) => onChange({ originalId: event.target.value || null })}
        options={[
          { value: '', label: 'Any original' },
          ...(originals.data?.originals ?? [])
            .filter((o) => o.status === 'ready')
            .map((o) => ({ value: o.id, label: counted(o.name, facetCount(facets?.originals, o.id) ?? 0) })),
        ]}
      />
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-semibold text-ink">Rights</legend>
        {rightsStatuses.map((status) => (
          <Checkbox
            key={status}
            label={counted(rightsWords[status].label, facets?.rights[status])}
            checked={query.rights.includes(status)}
            onChange={(event) => toggleRights(status, event.target.checked)}
          />
        ))}
      </fieldset>
      <RadioGroup
        legend="Used in products"
        name="usage"
        value={query.usage}
        onChange={(usage) => onChange({ usage })}
        options={[
          { value: 'any', label: 'Used or not' },
          { value: 'used', label: counted('Used', facets?.used) },
          { value: 'unused', label: counted('Not used yet', facets?.unused) },
        ]}
      />
      <RadioGroup
        legend="Hidden in the original"
        name="hidden"
        value={query.hiddenInOriginal === null ? 'any' : query.hiddenInOriginal ? 'hidden' : 'shown'}
        onChange={(v) => onChange({ hiddenInOriginal: v === 'any' ? null : v === 'hidden' })}
        options={[
          { value: 'any', label: 'Hidden or shown' },
          { value: 'hidden', label: counted('Only layers hidden in the file', facets?.hiddenInOriginal) },
          { value: 'shown', label: 'Only layers shown in the file' },
        ]}
      />
      <RadioGroup
        legend="Archived motifs"
        name="archived"
        value={query.archived}
        onChange={(archived) => onChange({ archived })}
        options={[
          { value: 'exclude', label: 'Leave them out' },
          { value: 'include', label: 'Include them' },
          { value: 'only', label: counted('Only archived', facets?.archived) },
        ]}
      />
      <Button variant="secondary" size="sm" className="self-start" onClick={() => onChange({ ...emptyLibraryQuery, q: query.q, sort: query.sort })}>
        Clear all filters
      </Button>
    </div>
  );
}
