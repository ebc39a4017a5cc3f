import { currencyMinorDigits } from '@shared/sales/parse-money';

/** Minor units (pence, cents) as money in the reader's locale, e.g. 123405 GBP → £1,234.05. */
export function formatMinor(minor: number, currency: string | null): string {
  if (!currency) return '–';
  const digits = currencyMinorDigits(currency) ?? 2;
  return new Intl.NumberFormat(undefined, { style: 'currency', currency }).format(minor / 10 ** digits);
}

/** Units, with a decimal only when a split rule made a fraction of one. */
export function formatUnits(units: number): string {
  return new Intl.NumberFormat(undefined, { maximumFractionDigits: Number.isInteger(units) ? 0 : 1 }).format(units);
}

export const splitRuleWords = {
  even: { label: 'Evenly', hint: 'Each motif a product prints gets the same share of its sales.' },
  area: { label: 'By printed area', hint: 'Motifs printed larger get a larger share (motif size × scale, summed per motif).' },
} as const;
