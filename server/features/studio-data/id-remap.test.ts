import { describe, expect, it } from 'vitest';
import { createIdMap, remapJson, remapText } from './id-remap';

const a = '0a000000-0000-4000-8000-000000000001';
const b = '0b000000-0000-4000-8000-000000000002';
const studio = '5e000000-0000-4000-8000-0000000000aa';

describe('giving records new ids', () => {
  it('hands out new ids in the old ids\' order', () => {
    const map = createIdMap([b, a, a.toUpperCase()]);
    expect(map.size).toBe(2);
    expect(map.get(a)! < map.get(b)!).toBe(true);
    expect(map.get(a)).not.toBe(a);
  });

  it('rewrites ids inside keys, layouts and map keys, and leaves other strings alone', () => {
    const map = new Map([[a, b], [studio, a]]);
    expect(remapText(`studios/${studio}/originals/${a}/file`, map)).toBe(`studios/${a}/originals/${b}/file`);
    const layout = { version: 2, placements: [{ id: 'p-1', type: 'motif', motifId: a, note: 'puffin' }], byMotif: { [a]: 1 } };
    expect(remapJson(layout, map)).toEqual({ version: 2, placements: [{ id: 'p-1', type: 'motif', motifId: b, note: 'puffin' }], byMotif: { [b]: 1 } });
    expect(remapJson([1, null, true], map)).toEqual([1, null, true]);
  });
});
