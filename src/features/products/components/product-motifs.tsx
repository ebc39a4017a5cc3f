import { Link } from 'react-router-dom';
import type { ProductDetail } from '@shared/contracts/products';
import { Badge } from '../../../components/ui/badge';

const rightsLabels: Record<string, string> = { own_work: 'Own work', licensed: 'Licensed', public_domain: 'Public domain', unknown: 'Rights unknown' };

// The motifs the layout places, the version each uses and whether the studio may print it.
export function ProductMotifs({ motifs }: { motifs: ProductDetail['motifs'] }) {
  if (motifs.length === 0) return <p className="text-ink-soft">No motifs placed yet. Open the layout to place some.</p>;
  return (
    <ul className="divide-y divide-sand/70">
      {motifs.map((m) => (
        <li key={m.motifId} className="flex flex-wrap items-center justify-between gap-2 py-2">
          <Link to={`/library/${m.motifId}`} className="font-semibold text-tide-deep underline">{m.name}</Link>
          <span className="flex flex-wrap items-center gap-1.5 text-sm">
            <span className="tabular-nums">version {m.usedVersion}</span>
            {m.usedVersion < m.currentVersion && <Badge tone="ochre">Newer version {m.currentVersion} exists</Badge>}
            <Badge tone={m.rightsStatus === 'unknown' ? 'rust' : 'neutral'}>{rightsLabels[m.rightsStatus] ?? m.rightsStatus}</Badge>
            {m.archived && <Badge tone="ochre">Archived</Badge>}
            <span className="text-ink-soft">{m.placementIds.length === 1 ? 'placed once' : `placed ${m.placementIds.length} times`}</span>
          </span>
        </li>
      ))}
    </ul>
  );
}
