import { describe, expect, it } from 'vitest';
import { facts, findingsOf, motif, severities, text } from './test-support/preflight-fixtures';

describe('rights rules', () => {
  it('warns about a motif with unknown rights', () => {
    expect(findingsOf('rights', [motif()], { motifs: [facts({ rightsStatus: 'unknown' })] })).toMatchObject([
      { severity: 'warning', placementId: 'puffin', message: '“Puffin” has unknown rights' },
    ]);
    expect(severities(findingsOf('rights', [motif()], { motifs: [facts({ rightsStatus: 'public_domain' })] }))).toEqual(['ok:product']);
  });

  it('warns about a quote without a source, and accepts one with it', () => {
    expect(severities(findingsOf('quote-source', [text({ isQuote: true, quoteSource: '  ' })]))).toEqual(['warning:title']);
    expect(severities(findingsOf('quote-source', [text({ isQuote: true, quoteSource: 'Coastal proverb, collected by Ines Okafor' })]))).toEqual(['ok:product']);
    expect(findingsOf('quote-source', [text()])).toEqual([]);
  });
});
