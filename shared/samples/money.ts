// Sample costs are typed by people ("12.50", "12,50", "1 250") and kept as whole minor units
// (cents, pence, yen) of an ISO 4217 currency, so sums stay exact.

export type MoneyProblem = { code: 'sample.bad_currency' | 'sample.bad_cost'; message: string };

let knownCurrencies: ReadonlySet<string> | null = null;

// The runtime's ISO 4217 list (Intl.supportedValuesOf, ECMA-402); both Node 20 and browsers have it.
export function isKnownCurrency(code: string): boolean {
  knownCurrencies ??= new Set(Intl.supportedValuesOf('currency'));
  return knownCurrencies.has(code);
}

// Digits after the decimal point for a currency: 2 for EUR, 0 for JPY, 3 for KWD (CLDR data via Intl).
export function currencyMinorDigits(code: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency: code }).resolvedOptions().maximumFractionDigits ?? 2;
}

export function normaliseCurrency(text: string): string {
  return text.trim().toUpperCase();
}

export function checkCurrency(text: string): { currency: string } | MoneyProblem {
  const currency = normaliseCurrency(text);
  if (!/^[A-Z]{3}$/.test(currency) || !isKnownCurrency(currency)) {
    return { code: 'sample.bad_currency', message: `"${text.trim()}" is not a currency code we know. Use a three-letter ISO 4217 code such as GBP, EUR, USD or JPY.` };
  }
  return { currency };
}

// One decimal separator ("." or ","), optional spaces, apostrophes or thin spaces as thousands marks.
const amountPattern = /^(\d{1,12})(?:[.,](\d+))?$/;

export function parseCostToMinor(text: string, currency: string): { minor: number } | MoneyProblem {
  const compact = text.trim().replace(/[\s\u00a0\u202f']/g, '');
  const digits = currencyMinorDigits(currency);
  const match = amountPattern.exec(compact);
  if (!match) {
    return { code: 'sample.bad_cost', message: `"${text.trim()}" is not an amount. Type it like 12.50${digits === 0 ? ' (or 1250 for a currency without cents)' : ''}.` };
  }
  const [, whole, fraction = ''] = match;
  if (fraction.length > digits) {
    return {
      code: 'sample.bad_cost',
      message: digits === 0 ? `${currency} has no smaller unit: type a whole amount such as ${whole}.` : `${currency} has ${digits} digits after the decimal point at most; "${text.trim()}" has ${fraction.length}.`,
    };
  }
  const minor = Number(whole) * 10 ** digits + Number(fraction.padEnd(digits, '0') || '0');
  if (!Number.isSafeInteger(minor) || minor > 2_147_483_647) {
    return { code: 'sample.bad_cost', message: 'That amount is too large for a sample order.' };
  }
  return { minor };
}

export function minorToAmount(minor: number, currency: string): number {
  return minor / 10 ** currencyMinorDigits(currency);
}

// The amount as people type it back into the form: "12.50", "1250" for JPY.
export function minorToInput(minor: number, currency: string): string {
  const digits = currencyMinorDigits(currency);
  if (digits === 0) return String(minor);
  const text = String(minor).padStart(digits + 1, '0');
  return `${text.slice(0, -digits)}.${text.slice(-digits)}`;
}

export function formatCost(minor: number, currency: string, locale?: string): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(minorToAmount(minor, currency));
}
