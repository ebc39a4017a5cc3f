import { describe, expect, it } from 'vitest';
import { readReferenceCsv } from '../colour/test-support/reference-csv';
import { card5x7Front, mug11oz } from '../templates';
import { findingsOf, severities, text } from './test-support/preflight-fixtures';

// wcag-contrast.csv: W3C WCAG 2.2 contrast ratios (SC 1.4.3: 4.5:1 normal text, 3:1 large text).
const ratios = readReferenceCsv('wcag-contrast.csv').filter((r) => r.kind === 'contrast' && r.bg === '#FFFFFF');
const ratioOf = (fg: string) => Number(ratios.find((r) => r.name_or_fg === fg)!.value);

describe('text rules', () => {
  it('warns about text under 8 pt at print size (common practice)', () => {
    expect(severities(findingsOf('text-size', [text({ sizePt: 6.5 })]))).toEqual(['warning:title']);
    expect(findingsOf('text-size', [text({ sizePt: 6.5 })])[0].message).toBe('The text “Puffin Picnic” is 6.5 pt at print size; below 8 pt text is hard to read');
    expect(severities(findingsOf('text-size', [text({ sizePt: 8 })]))).toEqual(['ok:product']);
  });

  it('warns below 4.5:1 against the blank’s body colour, as in the WCAG reference values', () => {
    const white = { ...card5x7Front, blank: { body: '#ffffff' } };
    expect(ratioOf('#777777')).toBeLessThan(4.5);
    expect(ratioOf('#767676')).toBeGreaterThanOrEqual(4.5);
    const grey = findingsOf('text-contrast', [text({ colour: '#777777', sizePt: 12 })], { template: white });
    expect(grey).toMatchObject([{ severity: 'warning', message: expect.stringContaining('4.47:1 against the blank’s colour; text this size needs 4.5:1') }]);
    expect(severities(findingsOf('text-contrast', [text({ colour: '#767676', sizePt: 12 })], { template: white }))).toEqual(['ok:product']);
  });

  it('asks only 3:1 of large text (18 pt and up), per WCAG’s large-scale definition', () => {
    const white = { ...card5x7Front, blank: { body: '#ffffff' } };
    expect(ratioOf('#949494')).toBeCloseTo(3.03, 2);
    expect(severities(findingsOf('text-contrast', [text({ colour: '#949494', sizePt: 24 })], { template: white }))).toEqual(['ok:product']);
    expect(severities(findingsOf('text-contrast', [text({ colour: '#949494', sizePt: 12 })], { template: white }))).toEqual(['warning:title']);
  });

  it('checks against the chosen variant’s body, or the measured backdrop when given', () => {
    const whiteText = text({ colour: '#ffffff' });
    expect(severities(findingsOf('text-contrast', [whiteText], { template: mug11oz }))).toEqual(['warning:title']);
    expect(severities(findingsOf('text-contrast', [whiteText], { template: mug11oz, variantId: 'heat-changing-cold' }))).toEqual(['ok:product']);
    expect(severities(findingsOf('text-contrast', [whiteText], { texts: [{ placementId: 'title', backdropColour: '#000000' }] }))).toEqual(['ok:product']);
  });

  it('with no variant chosen, also checks the variants’ blanks where the print shows: dark text on a black one', () => {
    const darkText = text({ colour: '#222222' });
    const withBlack = { ...mug11oz, variants: [...mug11oz.variants, { id: 'black', name: 'Black', blank: { body: '#111111' } }] };
    expect(findingsOf('text-contrast', [darkText], { template: withBlack })).toMatchObject([
      { severity: 'warning', message: expect.stringContaining('against the “Black” blank') },
    ]);
    // the cold heat-changing blank hides the print, text too: nothing to read against it
    expect(severities(findingsOf('text-contrast', [darkText], { template: mug11oz }))).toEqual(['ok:product']);
    // the chosen variant alone counts
    expect(severities(findingsOf('text-contrast', [darkText], { template: withBlack, variantId: 'heat-changing-warm' }))).toEqual(['ok:product']);
  });

  it('with no variant chosen, also checks the product’s own variants’ blanks, such as a custom navy body', () => {
    const darkText = text({ colour: '#222222' });
    expect(findingsOf('text-contrast', [darkText], { template: mug11oz, productBlanks: [{ name: 'Navy 11 oz', body: '#1f2a44' }] })).toMatchObject([
      { severity: 'warning', message: expect.stringContaining('against the “Navy 11 oz” blank') },
    ]);
    // one that matches the template's own blank adds nothing
    expect(severities(findingsOf('text-contrast', [darkText], { template: mug11oz, productBlanks: [{ name: 'White', body: '#FBFAF7' }] }))).toEqual(['ok:product']);
  });
});
