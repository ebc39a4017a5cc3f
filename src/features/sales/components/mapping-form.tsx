import type { SalesMappingInput } from '@shared/contracts/sales';
import { RadioGroup } from '../../../components/ui/radio-group';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';

// A mapping being edited: every field a string, '' for "not chosen yet".
export type DraftMapping = Record<'date' | 'sku' | 'quantity' | 'revenue' | 'currency' | 'fixedCurrency' | 'orderId' | 'dateFormat' | 'decimalSeparator' | 'delimiter', string>;

export const draftFrom = (suggested: Record<string, string>): DraftMapping => ({
  date: suggested.date ?? '',
  sku: suggested.sku ?? '',
  quantity: suggested.quantity ?? '',
  revenue: suggested.revenue ?? '',
  currency: suggested.currency ?? '',
  fixedCurrency: suggested.fixedCurrency ?? (suggested.currency ? '' : 'GBP'),
  orderId: suggested.orderId ?? '',
  dateFormat: suggested.dateFormat ?? '',
  decimalSeparator: suggested.decimalSeparator ?? '.',
  delimiter: suggested.delimiter ?? ',',
});

/** The mapping as the API takes it, or what is still missing. */
export function mappingFrom(draft: DraftMapping): { ok: true; mapping: SalesMappingInput } | { ok: false; missing: string[] } {
  const missing: string[] = (['date', 'sku', 'quantity', 'revenue', 'dateFormat'] as const).filter((k) => draft[k] === '');
  if (draft.currency === '' && draft.fixedCurrency.trim() === '') missing.push('currency');
  if (missing.length > 0) return { ok: false, missing };
  return {
    ok: true,
    mapping: {
      date: draft.date,
      sku: draft.sku,
      quantity: draft.quantity,
      revenue: draft.revenue,
      ...(draft.currency ? { currency: draft.currency } : { fixedCurrency: draft.fixedCurrency.trim().toUpperCase() }),
      ...(draft.orderId ? { orderId: draft.orderId } : {}),
      dateFormat: draft.dateFormat as SalesMappingInput['dateFormat'],
      decimalSeparator: draft.decimalSeparator as '.' | ',',
      delimiter: draft.delimiter as ',' | ';' | '\t',
    },
  };
}

const fieldWords = { date: 'Sale date', sku: 'SKU', quantity: 'Quantity', revenue: 'Revenue (line total)', orderId: 'Order number (optional)' } as const;

type Props = { columns: string[]; draft: DraftMapping; onChange: (draft: DraftMapping) => void; sampleDates: string[] };

export function MappingForm({ columns, draft, onChange, sampleDates }: Props) {
  const columnOptions = [{ value: '', label: '— choose a column —' }, ...columns.map((c) => ({ value: c, label: c }))];
  const set = (key: keyof DraftMapping) => (value: string) => onChange({ ...draft, [key]: value });
  const example = sampleDates.find((d) => /^\d{1,2}[/.-]\d{1,2}[/.-]\d{4}/.test(d.trim()));
  return (
    <div className="flex flex-col gap-5">
      <div className="grid gap-4 sm:grid-cols-2">
        {(Object.keys(fieldWords) as (keyof typeof fieldWords)[]).map((key) => (
          <SelectField key={key} label={fieldWords[key]} name={`map-${key}`} value={draft[key]} options={key === 'orderId' ? [{ value: '', label: '— none —' }, ...columns.map((c) => ({ value: c, label: c }))] : columnOptions} onChange={(e) => set(key)(e.target.value)}
            hint={key === 'orderId' ? 'With it, a later export that overlaps this one does not count a sale twice.' : undefined} />
        ))}
        <SelectField label="Currency" name="map-currency" value={draft.currency} options={[{ value: '', label: '— one currency for the whole file —' }, ...columns.map((c) => ({ value: c, label: c }))]} onChange={(e) => set('currency')(e.target.value)} />
        {draft.currency === '' && <TextField label="Currency of every row" name="map-fixed-currency" value={draft.fixedCurrency} maxLength={3} onChange={(e) => set('fixedCurrency')(e.target.value)} hint="A three-letter code, such as GBP or EUR." />}
      </div>
      <RadioGroup
        legend="How the dates are written"
        name="map-date-format"
        value={draft.dateFormat as 'ymd' | 'dmy' | 'mdy'}
        onChange={set('dateFormat')}
        options={[
          { value: 'dmy', label: 'Day first (14/03/2026)' },
          { value: 'mdy', label: 'Month first (03/14/2026)' },
          { value: 'ymd', label: 'Year first (2026-03-14)' },
        ]}
      />
      {draft.dateFormat === '' && example && <p className="-mt-3 text-sm text-ochre">“{example}” could be read either way: choose the order your shop writes.</p>}
      <div className="grid gap-4 sm:grid-cols-2">
        <RadioGroup legend="Decimal separator in amounts" name="map-decimal" inline value={draft.decimalSeparator as '.' | ','} onChange={set('decimalSeparator')} options={[{ value: '.', label: 'Point (12.50)' }, { value: ',', label: 'Comma (12,50)' }]} />
        <RadioGroup legend="Columns separated by" name="map-delimiter" inline value={draft.delimiter as ',' | ';' | '\t'} onChange={set('delimiter')} options={[{ value: ',', label: 'Comma' }, { value: ';', label: 'Semicolon' }, { value: '\t', label: 'Tab' }]} />
      </div>
    </div>
  );
}
