import { describe, expect, it } from 'vitest';
import { card5x7Front } from '../templates';
import { facts, findingsOf, motif, severities, text } from './test-support/preflight-fixtures';

describe('transparency, palette and soft-proof rules', () => {
  it('accepts transparency where the printer takes PNG with it', () => {
    expect(findingsOf('transparency', [motif()])).toMatchObject([{ severity: 'ok', message: expect.stringMatching(/kept/) }]);
  });

  it('warns about transparent motifs and see-through placements when the printer wants none', () => {
    const f = findingsOf('transparency', [motif(), motif({ id: 'solid', motifId: 'm-solid' }), text({ opacity: 0.5 })], {
      template: card5x7Front,
      motifs: [facts(), facts({ id: 'm-solid', hasTransparency: false })],
    });
    expect(severities(f)).toEqual(['warning:puffin', 'warning:title']);
  });

  it('compares the number of colour groups with the studio’s limit', () => {
    const groups = ['#112233', '#445566', '#778899', '#aabbcc', '#ddeeff', '#123456', '#654321'].map((hex) => ({ hex, share: 1 / 7 }));
    expect(findingsOf('palette', [motif()], { paletteGroups: groups })).toMatchObject([{ severity: 'warning', message: 'The design uses 7 colour groups; the studio’s limit is 6' }]);
    expect(severities(findingsOf('palette', [motif()], { paletteGroups: groups, options: { paletteLimit: 8 } }))).toEqual(['ok:product']);
    expect(findingsOf('palette', [motif()])).toEqual([]); // not analysed yet: nothing to say
  });

  it('reports the soft proof’s share of pixels moving more than ΔE00 5', () => {
    const [warn] = findingsOf('soft-proof', [motif()], { softProof: { shareOverDeltaE5: 0.12, profileName: 'ISO Coated v2 300% (FOGRA39)' } });
    expect(warn).toMatchObject({ severity: 'warning', message: '12% of the design will look noticeably different in print (a colour change of more than ΔE00 5 through ISO Coated v2 300% (FOGRA39))' });
    expect(findingsOf('soft-proof', [motif()], { softProof: { shareOverDeltaE5: 0.005 } })).toMatchObject([{ severity: 'ok', message: expect.stringMatching(/^0\.5% /) }]);
  });
});
