import { describe, expect, it } from 'vitest';
import { TextIndex } from './text-index';

const motif = (name: string, extra: Partial<{ tags: string[]; notes: string; originalName: string; sourcePath: string }> = {}) => ({
  name,
  tags: extra.tags ?? [],
  notes: extra.notes ?? '',
  originalName: extra.originalName ?? 'card.psd',
  sourcePath: extra.sourcePath ?? name,
});

function index() {
  const i = new TextIndex();
  i.set('fox', motif('Fox', { tags: ['lantern', 'autumn'] }));
  i.set('leaves', motif('Falling leaves', { notes: 'under the lantern' }));
  i.set('puffin', motif('Puffin', { tags: ['spring'] }));
  return i;
}

describe('the word index behind library search', () => {
  it('tolerates two letters swapped in a longer word', () => {
    expect([...index().search('lantren')!.keys()]).toContain('fox');
  });

  it('weights a tag above the notes', () => {
    const scores = index().search('lantern')!;
    expect(scores.get('fox')!).toBeGreaterThan(scores.get('leaves')!);
  });

  it('matches the start of a word while it is typed, and not the middle of a short one', () => {
    const i = index();
    expect([...i.search('pu')!.keys()]).toEqual(['puffin']);
    expect(i.search('ff')!.size).toBe(0);
  });

  it('forgets a motif’s old words when it changes and when it goes', () => {
    const i = index();
    i.set('puffin', motif('Gull', { tags: ['spring'] }));
    expect(i.search('puffin')!.size).toBe(0);
    expect([...i.search('gull')!.keys()]).toEqual(['puffin']);
    i.remove('puffin');
    expect(i.search('gull')!.size).toBe(0);
  });

  it('answers null for a query without words', () => {
    expect(index().search(' -- ')).toBeNull();
  });
});
