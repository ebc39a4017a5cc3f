import { describe, expect, it } from 'vitest';
import { dateOrderEvidence, parseSaleDay } from './parse-date';
import { currencyMinorDigits, parseCurrencyCode, parseQuantity, parseRevenueMinor } from './parse-money';

describe('sale dates', () => {
  it('reads ISO days, with or without a time of day', () => {
    expect(parseSaleDay('2026-03-14', 'ymd')).toEqual({ ok: true, day: '2026-03-14' });
    expect(parseSaleDay('2026-03-14T18:22:05Z', 'ymd')).toEqual({ ok: true, day: '2026-03-14' });
    expect(parseSaleDay(' 2026/3/4 09:15 ', 'dmy')).toEqual({ ok: true, day: '2026-03-04' });
  });

  it('reads 03/04/2026 in the order the mapping names, never by guessing', () => {
    expect(parseSaleDay('03/04/2026', 'dmy')).toEqual({ ok: true, day: '2026-04-03' });
    expect(parseSaleDay('03/04/2026', 'mdy')).toEqual({ ok: true, day: '2026-03-04' });
    expect(parseSaleDay('14.03.2026', 'dmy')).toEqual({ ok: true, day: '2026-03-14' });
    expect(parseSaleDay('14/03/2026', 'mdy')).toMatchObject({ ok: false, reason: 'there is no month 14' });
    expect(parseSaleDay('03/04/2026', 'ymd')).toMatchObject({ ok: false });
  });

  it('reads month names in either order', () => {
    expect(parseSaleDay('14 Mar 2026', 'mdy')).toEqual({ ok: true, day: '2026-03-14' });
    expect(parseSaleDay('March 14, 2026', 'dmy')).toEqual({ ok: true, day: '2026-03-14' });
    expect(parseSaleDay('4 Sept 2026', 'ymd')).toEqual({ ok: true, day: '2026-09-04' });
  });

  it('refuses impossible days, two-digit years and words', () => {
    expect(parseSaleDay('2026-02-29', 'ymd')).toMatchObject({ ok: false, reason: 'there is no day 29 in 2026-02' });
    expect(parseSaleDay('2028-02-29', 'ymd')).toEqual({ ok: true, day: '2028-02-29' });
    expect(parseSaleDay('14/03/26', 'dmy')).toMatchObject({ ok: false, reason: expect.stringContaining('two-digit year') });
    expect(parseSaleDay('yesterday', 'dmy')).toMatchObject({ ok: false, reason: '"yesterday" is not a date' });
    expect(parseSaleDay('', 'dmy')).toMatchObject({ ok: false, reason: 'the date is empty' });
  });

  it('tells the date order from values only when some value decides it', () => {
    expect(dateOrderEvidence(['2026-03-01', '2026-03-02'])).toBe('ymd');
    expect(dateOrderEvidence(['03/04/2026', '25/04/2026'])).toBe('dmy');
    expect(dateOrderEvidence(['03/04/2026', '04/25/2026'])).toBe('mdy');
    expect(dateOrderEvidence(['03/04/2026', '05/06/2026'])).toBeNull();
  });
});

describe('revenue in minor units', () => {
  it('reads decimals exactly, with thousands grouping and currency signs stripped', () => {
    expect(parseRevenueMinor('12.50', '.', 2)).toMatchObject({ ok: true, minor: 1250 });
    expect(parseRevenueMinor('£1,234.05', '.', 2)).toMatchObject({ ok: true, minor: 123405 });
    expect(parseRevenueMinor('1.234,05 €', ',', 2)).toMatchObject({ ok: true, minor: 123405 });
    expect(parseRevenueMinor('EUR 7,5', ',', 2)).toMatchObject({ ok: true, minor: 750, codeInText: 'EUR' });
    expect(parseRevenueMinor("1'000", '.', 0)).toMatchObject({ ok: true, minor: 1000 });
    // 0.1 + 0.2 style float error would show here: string arithmetic keeps it exact
    expect(parseRevenueMinor('0.30', '.', 2)).toMatchObject({ ok: true, minor: 30 });
  });

  it('reads refunds as negative amounts', () => {
    expect(parseRevenueMinor('-12.00', '.', 2)).toMatchObject({ ok: true, minor: -1200 });
    expect(parseRevenueMinor('(12.00)', '.', 2)).toMatchObject({ ok: true, minor: -1200 });
    expect(parseRevenueMinor('£-3.10', '.', 2)).toMatchObject({ ok: true, minor: -310 });
  });

  it('refuses a comma decimal read with "." as the separator instead of making it 1250', () => {
    const r = parseRevenueMinor('12,50', '.', 2);
    expect(r).toMatchObject({ ok: false });
    expect(!r.ok && r.reason).toContain('decimal separator');
    expect(parseRevenueMinor('12.345', '.', 2)).toMatchObject({ ok: false, reason: expect.stringContaining('more decimals') });
    expect(parseRevenueMinor('twelve', '.', 2)).toMatchObject({ ok: false });
    expect(parseRevenueMinor('', '.', 2)).toMatchObject({ ok: false, reason: 'the revenue is empty' });
  });

  it('knows each currency’s minor digits from ISO 4217 (via Intl/CLDR)', () => {
    // ISO 4217 list one: GBP and EUR 2, JPY 0, BHD 3
    expect([currencyMinorDigits('GBP'), currencyMinorDigits('JPY'), currencyMinorDigits('BHD')]).toEqual([2, 0, 3]);
    expect(parseCurrencyCode(' gbp ')).toEqual({ ok: true, code: 'GBP' });
    expect(parseCurrencyCode('XYZ')).toMatchObject({ ok: false });
    expect(parseCurrencyCode('£')).toMatchObject({ ok: false });
  });
});

describe('quantities', () => {
  it('takes whole numbers, negative for refunds', () => {
    expect(parseQuantity(' 3 ')).toEqual({ ok: true, quantity: 3 });
    expect(parseQuantity('-1')).toEqual({ ok: true, quantity: -1 });
    expect(parseQuantity('1.5')).toMatchObject({ ok: false });
    expect(parseQuantity('')).toMatchObject({ ok: false, reason: 'the quantity is empty' });
  });
});
