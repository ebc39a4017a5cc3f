import type { SeedMotif } from '../../tests/api/support/library-seed';

// Saltmarsh Studio's subjects over years of cards, mugs and totes (invented).
export const subjects = [
  'puffin', 'lantern', 'fox', 'kite', 'wave', 'basket', 'sandwich', 'leaf', 'acorn', 'moon', 'star', 'shell', 'gull', 'boat',
  'anchor', 'rope', 'jumper', 'picnic', 'teapot', 'cake', 'owl', 'mushroom', 'hedgehog', 'berry', 'raincloud', 'sun', 'lighthouse',
  'crab', 'seal', 'oyster', 'heron', 'otter', 'badger', 'pinecone', 'snowflake', 'scarf', 'mitten', 'bunting', 'bicycle', 'umbrella',
  'jellyfish', 'starfish', 'seaweed', 'pebble', 'driftwood', 'cottage', 'harbour', 'beacon', 'lobster', 'whale',
];
const qualities = ['small', 'large', 'sleeping', 'waving', 'knitted', 'striped', 'golden', 'autumn', 'spring', 'night', 'rainy', 'happy', 'tiny', 'old', 'red', 'blue'];
const themes = ['coastal spring', 'lantern walk', 'winter market', 'summer fair', 'harvest', 'birthday', 'christmas', 'wedding'];
const noteWords = ['drawn', 'for', 'the', 'card', 'with', 'a', 'in', 'corner', 'reworked', 'from', 'sketchbook', 'print', 'run', 'customer', 'favourite', 'matches', 'mug', 'tote'];

// A studio palette: inks, creams and the seasonal colours, jittered per motif.
const palette = ['#1d1f2a', '#fbf7ef', '#c8283c', '#f07d28', '#f6c744', '#2a8cc8', '#3a7bd5', '#5b8c5a', '#a4502a', '#d9692b', '#8a8f9a', '#f4a3a8', '#6b4e9b', '#2f5d62', '#e2553f', '#9fc5e8'];

// Deterministic, so every run searches the same library.
function random(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

const pick = <T>(r: () => number, list: readonly T[]) => list[Math.floor(r() * list.length)];

function jitter(r: () => number, hex: string) {
  const n = Number.parseInt(hex.slice(1), 16);
  const channel = (shift: number) => Math.max(0, Math.min(255, ((n >> shift) & 0xff) + Math.round((r() - 0.5) * 24)));
  return `#${[16, 8, 0].map((s) => channel(s).toString(16).padStart(2, '0')).join('')}`;
}

export function benchMotifs(count: number, seed = 42): { originalName: string; motifs: SeedMotif[] }[] {
  const r = random(seed);
  const originals: { originalName: string; motifs: SeedMotif[] }[] = [];
  const perOriginal = 50;
  for (let o = 0; o * perOriginal < count; o++) {
    const theme = pick(r, themes);
    const originalName = `${theme.replace(' ', '-')}-${pick(r, ['card', 'mug', 'tote', 'sticker-sheet'])}-${o + 1}.psd`;
    const motifs: SeedMotif[] = [];
    for (let i = 0; i < perOriginal && o * perOriginal + i < count; i++) {
      const subject = pick(r, subjects);
      const name = `${pick(r, qualities)} ${subject}${r() < 0.3 ? ` with ${pick(r, subjects)}` : ''}${r() < 0.5 ? ` ${1 + Math.floor(r() * 9)}` : ''}`;
      const tags = [...new Set([subject, pick(r, subjects), theme, ...(r() < 0.5 ? [pick(r, qualities)] : [])])];
      const shares = [0.5 + r() * 0.3, 0.1 + r() * 0.2, 0.05 + r() * 0.1];
      const total = shares.reduce((a, b) => a + b, 0);
      motifs.push({
        name: name[0].toUpperCase() + name.slice(1),
        tags,
        sourcePath: `${pick(r, ['Characters', 'Background', 'Props', 'Border'])}/${name}`,
        notes: r() < 0.3 ? Array.from({ length: 6 + Math.floor(r() * 10) }, () => (r() < 0.25 ? pick(r, subjects) : pick(r, noteWords))).join(' ') : '',
        colours: shares.map((share) => ({ hex: jitter(r, pick(r, palette)), share: share / total })),
        dhash: Array.from({ length: 16 }, () => Math.floor(r() * 16).toString(16)).join(''),
        width: 200 + Math.floor(r() * 2800),
        height: 200 + Math.floor(r() * 2800),
        rightsStatus: r() < 0.9 ? 'own_work' : pick(r, ['licensed', 'public_domain', 'unknown'] as const),
        archived: r() < 0.05,
      });
    }
    originals.push({ originalName, motifs });
  }
  return originals;
}

// As a user types each word letter by letter, and the slips people make.
export function typedQueries(): string[] {
  const words = ['puffin', 'lantern', 'hedgehog', 'lighthouse', 'jellyfish', 'coastal spring', 'fox lantern'];
  const typed = words.flatMap((w) => Array.from({ length: w.length }, (_, i) => w.slice(0, i + 1)).filter((q) => q.trim() === q));
  return [...new Set(typed)];
}
export const misspelt = ['pufin', 'puffn', 'lantren', 'lantenr', 'hedgehgo', 'ligthouse', 'jelyfish', 'otetr', 'snowflak', 'bicylce', 'umbrela', 'starfsh'];
export const colourQueries = ['#c8283c', '#f07d28', '#2a8cc8', '#1d1f2a', '#fbf7ef', '#5b8c5a', '#a4502a', '#6b4e9b', '#9fc5e8', '#e2553f', '#777777', '#00ff00'];
