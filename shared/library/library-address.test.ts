import { describe, expect, it } from 'vitest';
import { motifListQuerySchema } from '../contracts/motifs';
import { emptyLibraryQuery, motifListSearch, readLibraryQuery, toMotifFilter, writeLibraryQuery } from './library-address';

const collectionId = '1c1b6c0e-7a2b-4d4f-9a57-2b1d0c9a7f10';

describe('library query in the address bar', () => {
  it('writes nothing for the whole library, newest first', () => {
    expect(writeLibraryQuery(emptyLibraryQuery).toString()).toBe('');
  });

  it('reads back every filter it wrote', () => {
    const query = {
      ...emptyLibraryQuery,
      q: 'puffin',
      tags: ['coastal spring', 'puffin'],
      collectionId,
      colour: '#e6813a',
      rights: ['unknown' as const, 'licensed' as const],
      usage: 'unused' as const,
      hiddenInOriginal: true,
      archived: 'include' as const,
      sort: 'most_used' as const,
    };
    expect(readLibraryQuery(writeLibraryQuery(query))).toEqual(query);
  });

  it('drops values a hand-edited address got wrong instead of failing the page', () => {
    const query = readLibraryQuery(new URLSearchParams('colour=orange&collection=42&rights=mine,unknown&sort=loudest&usage=sometimes&tags=,kite,'));
    expect(query.colour).toBeNull();
    expect(query.collectionId).toBeNull();
    expect(query.rights).toEqual(['unknown']);
    expect(query.sort).toBe('best');
    expect(query.usage).toBe('any');
    expect(query.tags).toEqual(['kite']);
  });

  it('normalises tags the way the server stores them', () => {
    expect(readLibraryQuery(new URLSearchParams('tags=  Coastal   Spring ')).tags).toEqual(['coastal spring']);
  });

  it("asks the API with the names of its own query schema, which accepts them", () => {
    const search = motifListSearch({ ...emptyLibraryQuery, q: 'lantren', colour: '#e6813a', collectionId, hiddenInOriginal: false }, 240, 120);
    const params = new URLSearchParams(search);
    expect(params.get('colour')).toBe('e6813a');
    const parsed = motifListQuerySchema.parse(Object.fromEntries(params));
    expect(parsed).toMatchObject({ q: 'lantren', colour: '#e6813a', collectionId, hiddenInOriginal: false, offset: 240, limit: 120 });
  });

  it('turns the query into the bulk-edit filter, which the API schema accepts', () => {
    const filter = toMotifFilter({ ...emptyLibraryQuery, q: 'fox', tags: ['lantern'], archived: 'only' });
    expect(filter).toMatchObject({ q: 'fox', tags: ['lantern'], archived: 'only', usage: 'any' });
    expect(motifListQuerySchema.safeParse(filter).success).toBe(true);
  });
});
