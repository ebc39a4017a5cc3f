import { useState } from 'react';
import { Link } from 'react-router-dom';
import { can } from '@shared/auth/permissions';
import type { SalesSplitRule } from '@shared/contracts/sales';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { RadioGroup } from '../../../components/ui/radio-group';
import { Select } from '../../../components/ui/select-field';
import { LoadingState } from '../../../components/ui/spinner';
import { formatDay } from '../../../lib/format';
import { useSession } from '../../auth/components/session';
import { useSalesSummary } from '../api/get-sales-summary';
import { useSalesSettings } from '../api/get-sales-settings';
import { useUpdateSalesSettings } from '../api/update-sales-settings';
import { ImportFlow } from '../components/import-flow';
import { ImportsList } from '../components/imports-list';
import { PeriodPicker, periodPresets, type Period, type PeriodPreset } from '../components/period-picker';
import { RankedTable } from '../components/ranked-table';
import { SalesChart } from '../components/sales-chart';
import { formatMinor, formatUnits, splitRuleWords } from '../components/sales-format';

export function SalesPage() {
  const me = useSession();
  const canImport = can(me.role, 'sales.import');
  const [preset, setPreset] = useState<PeriodPreset>('12m');
  const [period, setPeriod] = useState<Period>(() => periodPresets['12m'].period());
  const [split, setSplit] = useState<SalesSplitRule | undefined>(undefined);
  const [currency, setCurrency] = useState<string | undefined>(undefined);
  const settings = useSalesSettings();
  const saveRule = useUpdateSalesSettings();
  const summary = useSalesSummary({ ...period, split, currency });
  const s = summary.data;
  const rule = s?.splitRule ?? split ?? settings.data?.splitRule ?? 'even';

  return (
    <>
      <PageHeader title="What sells" description="Shop sales rolled up to products, their variants and the motifs they print." />
      <div className="flex flex-col gap-6">
        <Card>
          <div className="flex flex-wrap items-end gap-6">
            <PeriodPicker preset={preset} period={period} onChange={(p, next) => { setPreset(p); setPeriod(next); }} />
            <RadioGroup
              inline
              legend="Share a product’s sales among its motifs"
              name="split-rule"
              value={rule}
              onChange={(next) => setSplit(next)}
              options={(['even', 'area'] as const).map((value) => ({ value, label: splitRuleWords[value].label }))}
            />
            {s && s.currencies.length > 1 && (
              <label className="flex flex-col gap-1 font-semibold text-ink">
                Revenue in
                <Select value={s.currency ?? ''} onChange={(e) => setCurrency(e.target.value)} options={s.currencies.map((c) => ({ value: c.currency, label: c.currency }))} />
              </label>
            )}
          </div>
          <p className="mt-3 text-sm text-ink-soft" aria-live="polite">
            Motif figures use the rule <strong className="text-ink">{splitRuleWords[rule].label.toLowerCase()}</strong>: {splitRuleWords[rule].hint}
            {canImport && settings.data && rule !== settings.data.splitRule && (
              <button type="button" className="ml-2 text-tide-deep underline" onClick={() => saveRule.mutate(rule)} disabled={saveRule.isPending}>Make it the studio’s rule</button>
            )}
          </p>
        </Card>

        {summary.isPending && <LoadingState label="Adding up the sales…" />}
        {summary.isError && <ErrorState error={summary.error} title="The sales could not be added up" onRetry={() => void summary.refetch()} retrying={summary.isRefetching} />}
        {s && (
          <>
            <Card title={`${formatUnits(s.totals.units)} units${s.currency ? `, ${formatMinor(s.totals.revenueMinor, s.currency)}` : ''}`} description={`${formatDay(s.from)} – ${formatDay(s.to)}${s.currencies.length > 1 ? `; also sold in ${s.currencies.filter((c) => c.currency !== s.currency).map((c) => c.currency).join(', ')} (units counted, revenue kept apart)` : ''}`}>
              <SalesChart series={s.series} granularity={s.granularity} currency={s.currency} label="All products" />
            </Card>
            <div className="grid gap-6 xl:grid-cols-2">
              <Card title="Products" description="Each product’s variants added together.">
                <RankedTable noun="products" caption="Products ranked" currency={s.currency} empty="Import a sales file, or choose a longer period."
                  rows={s.products.map((p) => ({ id: p.productId, name: <Link to={`/products/${p.productId}`} className="font-semibold text-tide-deep underline">{p.name}</Link>, detail: <span className="capitalize">{p.stage}</span>, units: p.units, revenueMinor: p.revenueMinor }))} />
              </Card>
              <Card title="Motifs" description={`A product’s sales shared ${rule === 'even' ? 'evenly among the motifs it prints' : 'by the printed area of each motif'}.`}>
                <RankedTable noun="motifs" caption={`Motifs ranked, sales shared ${splitRuleWords[rule].label.toLowerCase()}`} currency={s.currency} empty="Sold products that print motifs show up here."
                  rows={s.motifs.map((m) => ({ id: m.motifId, name: <Link to={`/library/${m.motifId}`} className="font-semibold text-tide-deep underline">{m.name}</Link>, detail: `on ${m.productCount} product${m.productCount === 1 ? '' : 's'}`, units: m.units, revenueMinor: m.revenueMinor, share: m.shareOfUnits }))} />
              </Card>
            </div>
            <Card title="Variants" description="By SKU.">
              <RankedTable noun="variants" caption="Variants ranked" currency={s.currency} empty="No variant sold in this period."
                rows={s.variants.map((v) => ({ id: v.variantId, name: `${v.productName} — ${v.name}`, detail: v.sku, units: v.units, revenueMinor: v.revenueMinor }))} />
              {s.unmatched.length > 0 && (
                <p className="mt-3 text-sm text-ochre">Sales of SKUs no variant has any more: {s.unmatched.map((u) => `${u.sku} (${formatUnits(u.units)})`).join(', ')}.</p>
              )}
            </Card>
          </>
        )}

        {canImport && (
          <Card title="Import sales" description="A CSV export of your shop’s order lines: date, SKU, quantity, revenue and currency.">
            <ImportFlow />
          </Card>
        )}
        <Card title="Imports" description={canImport ? 'Undo an import to take its rows out again.' : 'Files imported by the studio.'}>
          <ImportsList canUndo={canImport} />
        </Card>
      </div>
    </>
  );
}
