import { describe, expect, it } from 'vitest';
import { searchWords } from './search-words';

describe('words of a motif as search sees them', () => {
  it('splits names, paths and file names into lower-case words without accents', () => {
    expect(searchWords('Puffins/Body copy')).toEqual(['puffins', 'body', 'copy']);
    expect(searchWords('lantern-walk_v2.psd')).toEqual(['lantern', 'walk', 'v2', 'psd']);
    expect(searchWords('Café Crème')).toEqual(['cafe', 'creme']);
  });
});
