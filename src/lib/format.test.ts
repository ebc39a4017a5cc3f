import { afterAll, describe, expect, it } from 'vitest';

// West of UTC, midnight UTC of 1 March is still 28 February locally; a bare date must not
// slip a day. Node re-reads TZ when it changes, so the module is loaded after setting it.
const previousTz = process.env.TZ;
process.env.TZ = 'America/Los_Angeles';
const { formatDay } = await import('./format');

afterAll(() => {
  process.env.TZ = previousTz;
});

describe('formatDay', () => {
  it('names a bare calendar date as that day wherever the reader is', () => {
    const shown = formatDay('2027-03-01');
    expect(shown).toMatch(/\b1\b/);
    expect(shown).toMatch(/Mar/);
    expect(shown).toMatch(/2027/);
  });

  it('shows a timestamp as the local day', () => {
    // 03:00 UTC on 1 March is 19:00 on 28 February in Los Angeles (UTC−8 in winter)
    const shown = formatDay('2027-03-01T03:00:00.000Z');
    expect(shown).toMatch(/\b28\b/);
    expect(shown).toMatch(/Feb/);
  });

  it('gives back text that is not a date unchanged', () => {
    expect(formatDay('soon')).toBe('soon');
  });
});
