export type ParsedMoney = { ok: true; minor: number; codeInText: string | null } | { ok: false; reason: string };

const digitsCache = new Map<string, number | null>();

/**
 * Minor-unit digits of an ISO 4217 currency (GBP 2, JPY 0, BHD 3), from the platform's Intl data
 * (CLDR); null for a code Intl does not know.
 */
export function currencyMinorDigits(code: string): number | null {
  const cached = digitsCache.get(code);
  if (cached !== undefined) return cached;
  let digits: number | null = null;
  const known = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('currency') : null;
  if (/^[A-Z]{3}$/.test(code) && (!known || known.includes(code))) {
    try {
      digits = new Intl.NumberFormat('en', { style: 'currency', currency: code }).resolvedOptions().maximumFractionDigits ?? 2;
    } catch {
      digits = null;
    }
  }
  digitsCache.set(code, digits);
  return digits;
}

export function parseCurrencyCode(raw: string): { ok: true; code: string } | { ok: false; reason: string } {
  const code = raw.trim().toUpperCase();
  if (code === '') return { ok: false, reason: 'the currency is empty' };
  if (currencyMinorDigits(code) === null) return { ok: false, reason: `"${raw.trim().slice(0, 20)}" is not an ISO 4217 currency code` };
  return { ok: true, code };
}

// Currency signs (£ $ € ¥ …), a short code or letters around them ("US$", "EUR", "kr"), and C1
// control characters left by a cp1252 file read as latin-1 (its € is 0x80).
const symbolEnds = /^[\p{Sc}\p{L}\u0080-\u009f]{0,4}\s*|\s*[\p{Sc}\p{L}\u0080-\u009f]{0,4}$/gu;

/**
 * A revenue cell in minor units of `currency`, exactly (string arithmetic, no floats).
 * The decimal separator comes from the mapping; the other of '.' and ',' (and spaces, the
 * apostrophe) may group thousands, in groups of three, so "12,50" read with '.' as the decimal
 * separator is refused instead of becoming 1250. A leading or trailing minus and accounting
 * parentheses make it negative (refunds). More decimals than the currency has are refused.
 */
export function parseRevenueMinor(raw: string, decimalSeparator: '.' | ',', minorDigits: number): ParsedMoney {
  const trimmed = raw.trim();
  if (trimmed === '') return { ok: false, reason: 'the revenue is empty' };
  let text = trimmed;
  let negative = false;
  if (/^\(.*\)$/.test(text)) {
    negative = true;
    text = text.slice(1, -1).trim();
  }
  const letters = /[A-Za-z]{3}/.exec(text);
  const codeInText = letters ? letters[0].toUpperCase() : null;
  text = text.replace(symbolEnds, '');
  if (/^[-\u2212]/.test(text) || /-$/.test(text)) {
    negative = true;
    text = text.replace(/^[-\u2212]\s*|\s*-$/g, '');
  }
  text = text.replace(symbolEnds, '').replace(/^\+/, '');
  const group = decimalSeparator === '.' ? ',' : '.';
  const shape = new RegExp(`^(\\d{1,3}(?:[${escape(group)} '\u00a0\u202f]\\d{3})+|\\d+)(?:${escape(decimalSeparator)}(\\d+))?$`);
  const m = shape.exec(text);
  if (!m) {
    const hint = text.includes(group) && !text.includes(decimalSeparator) ? ` (is "${group}" the decimal separator? Change it in the mapping)` : '';
    return { ok: false, reason: `"${trimmed.slice(0, 40)}" is not an amount${hint}` };
  }
  const whole = m[1].replace(/\D/g, '');
  const fraction = m[2] ?? '';
  if (fraction.length > minorDigits) {
    return { ok: false, reason: `"${trimmed.slice(0, 40)}" has more decimals than the currency has (${minorDigits})` };
  }
  const minorText = `${whole}${fraction.padEnd(minorDigits, '0')}`.replace(/^0+(?=\d)/, '');
  const minor = Number(minorText);
  if (!Number.isSafeInteger(minor)) return { ok: false, reason: `"${trimmed.slice(0, 40)}" is too large` };
  return { ok: true, minor: negative && minor !== 0 ? -minor : minor, codeInText };
}

const escape = (c: string) => c.replace(/[.\\]/g, (x) => `\\${x}`);

/** A quantity: a whole number, negative for a refund or return. */
export function parseQuantity(raw: string): { ok: true; quantity: number } | { ok: false; reason: string } {
  const text = raw.trim().replace(/^\+/, '').replace(/^\u2212/, '-');
  if (text === '') return { ok: false, reason: 'the quantity is empty' };
  if (!/^-?\d{1,9}$/.test(text)) return { ok: false, reason: `"${raw.trim().slice(0, 20)}" is not a whole number of items` };
  const quantity = Number(text);
  return { ok: true, quantity: quantity === 0 ? 0 : quantity };
}
