import { Link } from 'react-router-dom';
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useMotifSales } from '../api/get-motif-sales';
import { periodPresets } from './period-picker';
import { SalesChart } from './sales-chart';
import { formatMinor, formatUnits, splitRuleWords } from './sales-format';

const percent = new Intl.NumberFormat(undefined, { style: 'percent', maximumFractionDigits: 1 });

/** The motif page's sales line: the last 12 months, under the studio's split rule. */
export function MotifSalesSection({ motifId }: { motifId: string }) {
  const sales = useMotifSales(motifId, periodPresets['12m'].period());
  const s = sales.data;
  return (
    <Card title="Sales" description={s ? `Last 12 months; a product’s sales shared ${splitRuleWords[s.splitRule].label.toLowerCase()} among its motifs.` : 'Last 12 months.'}>
      {sales.isPending && <LoadingState label="Loading the sales…" />}
      {sales.isError && <ErrorState error={sales.error} onRetry={() => void sales.refetch()} retrying={sales.isRefetching} />}
      {s && s.products.length === 0 && <EmptyState title="No product uses this motif yet" />}
      {s && s.products.length > 0 && (
        <div className="flex flex-col gap-4">
          <p className="text-lg font-semibold text-ink">
            {formatUnits(s.totals.units)} units{s.currency ? `, ${formatMinor(s.totals.revenueMinor, s.currency)}` : ''}
          </p>
          <SalesChart series={s.series} granularity={s.granularity} currency={s.currency} label="This motif’s share" />
          <ul className="flex flex-col gap-1 text-sm">
            {s.products.map((p) => (
              <li key={p.productId}>
                <Link to={`/products/${p.productId}`} className="text-tide-deep underline">{p.name}</Link>: {percent.format(p.share)} of its sales, {formatUnits(p.units)} units
              </li>
            ))}
          </ul>
          <Link to="/sales" className="self-start text-tide-deep underline">What sells across the studio</Link>
        </div>
      )}
    </Card>
  );
}
