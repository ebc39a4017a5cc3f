import { activityKinds } from '@shared/contracts/activity';
import { SelectField } from '../../../components/ui/select-field';
import type { ActivityFilters as Filters } from '../api/activity-keys';
import { activityKindLabels } from '../activity-words';

export function filtersFromSearch(params: URLSearchParams): Filters {
  const actor = params.get('actor') ?? undefined;
  const kind = params.get('kind') ?? undefined;
  return { actor: actor || undefined, kind: kind && (activityKinds as readonly string[]).includes(kind) ? kind : undefined };
}

type ActivityFiltersProps = { filters: Filters; people: readonly { id: string; name: string }[]; onChange: (filters: Filters) => void };

export function ActivityFilters({ filters, people, onChange }: ActivityFiltersProps) {
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <SelectField
        label="Person"
        name="actor"
        value={filters.actor ?? ''}
        onChange={(e) => onChange({ ...filters, actor: e.target.value || undefined })}
        options={[{ value: '', label: 'Everyone' }, ...people.map((p) => ({ value: p.id, label: p.name }))]}
      />
      <SelectField
        label="What happened"
        name="kind"
        value={filters.kind ?? ''}
        onChange={(e) => onChange({ ...filters, kind: e.target.value || undefined })}
        options={[{ value: '', label: 'Everything' }, ...activityKinds.map((k) => ({ value: k, label: activityKindLabels[k] }))]}
      />
    </div>
  );
}
