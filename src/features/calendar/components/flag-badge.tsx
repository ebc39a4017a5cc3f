import type { CalendarProduct } from '@shared/contracts/calendar';
import { Badge } from '../../../components/ui/badge';
import { flagTones, flagWords } from './calendar-words';

// Late and at-risk carry a mark and words as well as a colour.
export function FlagBadge({ product }: { product: Pick<CalendarProduct, 'flag' | 'daysUntilReadyBy'> }) {
  const mark = product.flag === 'late' ? '!' : product.flag === 'at_risk' ? '⏳' : null;
  return (
    <Badge tone={flagTones[product.flag]}>
      {mark && <span aria-hidden="true">{mark}</span>}
      {flagWords(product)}
    </Badge>
  );
}
