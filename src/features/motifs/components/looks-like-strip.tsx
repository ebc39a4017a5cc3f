import { Link } from 'react-router-dom';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useLooksLike } from '../api/get-looks-like';
import { MotifThumbnail } from './motif-thumbnail';

// Near-duplicates by picture: the same character imported twice, at another size or slightly changed.
export function LooksLikeStrip({ motifId }: { motifId: string }) {
  const looksLike = useLooksLike(motifId);
  if (looksLike.isPending) return <LoadingState label="Looking for similar motifs…" className="py-4" />;
  if (looksLike.isError) return <ErrorState error={looksLike.error} title="Similar motifs could not be found" onRetry={() => void looksLike.refetch()} />;
  const motifs = looksLike.data.motifs;
  if (motifs.length === 0) return <p className="text-ink-soft">No other motif looks like this one.</p>;
  return (
    <ul className="flex gap-3 overflow-x-auto pb-2">
      {motifs.map((motif) => (
        <li key={motif.id} className="w-36 shrink-0">
          <Link to={`/library/${motif.id}`} className="flex flex-col gap-1 rounded-lg border border-sand bg-paper p-1.5 hover:border-tide">
            <MotifThumbnail src={motif.thumbUrl} cell={6} />
            <span className="truncate px-0.5 text-sm font-semibold text-ink" title={motif.name}>
              {motif.name}
            </span>
            <span className="truncate px-0.5 text-xs text-ink-soft">
              {motif.distance === 0 ? 'Looks the same' : `${motif.distance} of 64 bits apart`} · {motif.originalName}
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
