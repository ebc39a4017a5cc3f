import { classNames } from '../../../components/ui/class-names';

export type ProductsView = 'table' | 'board';

const views: { value: ProductsView; label: string }[] = [
  { value: 'table', label: 'Table' },
  { value: 'board', label: 'Board by stage' },
];

// Two pressed-state buttons: the chosen view is announced as pressed.
export function ViewToggle({ view, onChange }: { view: ProductsView; onChange: (v: ProductsView) => void }) {
  return (
    <div role="group" aria-label="Show products as" className="inline-flex rounded-md border border-sand bg-paper p-0.5">
      {views.map((v) => (
        <button
          key={v.value}
          type="button"
          aria-pressed={view === v.value}
          onClick={() => onChange(v.value)}
          className={classNames('min-h-9 rounded px-3 text-sm font-semibold', view === v.value ? 'bg-tide text-paper' : 'text-ink hover:bg-sand/60')}
        >
          {v.label}
        </button>
      ))}
    </div>
  );
}
