import { describe, expect, it } from 'vitest';
import { enamelCampMug, mug11oz, totePanel } from '../templates';
import { cautionsFor, cautionsText } from './cautions';

describe('cautions before a download', () => {
  it('reminds of hot drinks, dishwasher, microwave and food-contact rules for a mug, deferring to the printer', () => {
    const lines = cautionsFor(mug11oz);
    expect(lines[0]).toMatch(/printer's instructions .* come first/);
    for (const topic of [/Hot drinks/, /Dishwasher/, /Microwave/, /Food contact/, /Heat-changing/]) expect(lines.some((l) => topic.test(l))).toBe(true);
  });

  it('adds the enamel notes for an enamel mug', () => {
    expect(cautionsFor(enamelCampMug).some((l) => /Enamel mugs are metal/.test(l))).toBe(true);
    expect(cautionsFor(mug11oz).some((l) => /Enamel mugs/.test(l))).toBe(false);
  });

  it('knows a heat-changing blank by its variant that hides the print, whatever its id', () => {
    const custom = { ...mug11oz, variants: [{ id: 'black-magic', name: 'Colour-change, cold', blank: { body: '#111111' }, hidesPrint: true }] };
    expect(cautionsFor(custom).some((l) => /Heat-changing mugs/.test(l))).toBe(true);
    const plain = { ...mug11oz, variants: [] };
    expect(cautionsFor(plain).some((l) => /Heat-changing mugs/.test(l))).toBe(false);
  });

  it('says a tote is not for food, and lists every line in the text file', () => {
    expect(cautionsFor(totePanel)).toContain('This product is not meant for food or drink; no food-contact or heat claims apply.');
    expect(cautionsText(totePanel).split('\n').filter((l) => l.startsWith('- '))).toHaveLength(cautionsFor(totePanel).length);
  });
});
