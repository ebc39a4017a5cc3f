import { describe, expect, it } from 'vitest';
import { checkCurrency, currencyMinorDigits, formatCost, minorToInput, parseCostToMinor } from './money';

describe('sample costs', () => {
  // minor units from ISO 4217's table: GBP 2, JPY 0, KWD 3 (as the runtime's CLDR data gives them)
  it('knows how many minor digits a currency has', () => {
    expect([currencyMinorDigits('GBP'), currencyMinorDigits('JPY'), currencyMinorDigits('KWD')]).toEqual([2, 0, 3]);
  });

  it('turns typed amounts into minor units', () => {
    expect(parseCostToMinor('12.50', 'GBP')).toEqual({ minor: 1250 });
    expect(parseCostToMinor(' 12,5 ', 'EUR')).toEqual({ minor: 1250 });
    expect(parseCostToMinor('1 250', 'JPY')).toEqual({ minor: 1250 });
    expect(parseCostToMinor('3.125', 'KWD')).toEqual({ minor: 3125 });
    expect(parseCostToMinor('0.07', 'USD')).toEqual({ minor: 7 });
  });

  it('refuses amounts that are not amounts or are more precise than the currency', () => {
    for (const text of ['', 'twelve', '-3', '1.2.3', '£12']) expect(parseCostToMinor(text, 'GBP')).toMatchObject({ code: 'sample.bad_cost' });
    expect(parseCostToMinor('12.5', 'JPY')).toMatchObject({ code: 'sample.bad_cost' });
    expect(parseCostToMinor('1.001', 'GBP')).toMatchObject({ code: 'sample.bad_cost' });
  });

  it('accepts ISO 4217 codes in any case and refuses made-up ones', () => {
    expect(checkCurrency(' gbp ')).toEqual({ currency: 'GBP' });
    expect(checkCurrency('XYZ')).toMatchObject({ code: 'sample.bad_currency' });
    expect(checkCurrency('POUNDS')).toMatchObject({ code: 'sample.bad_currency' });
  });

  it('gives the amount back as typed and as people read it', () => {
    expect(minorToInput(1250, 'GBP')).toBe('12.50');
    expect(minorToInput(7, 'USD')).toBe('0.07');
    expect(minorToInput(1250, 'JPY')).toBe('1250');
    expect(formatCost(1250, 'GBP', 'en-GB')).toBe('£12.50');
    expect(formatCost(1250, 'JPY', 'en-GB')).toBe('JP¥1,250');
  });
});
