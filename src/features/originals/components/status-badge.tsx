import type { OriginalSummary } from '@shared/contracts/originals';
import { Badge } from '../../../components/ui/badge';
import { statusWords } from '../import-words';

export function StatusBadge({ original }: { original: Pick<OriginalSummary, 'status' | 'percent'> }) {
  const words = statusWords[original.status];
  return (
    <Badge tone={words.tone}>
      {words.label}
      {original.status === 'importing' && <span className="tabular-nums">{Math.round(original.percent)} %</span>}
    </Badge>
  );
}
