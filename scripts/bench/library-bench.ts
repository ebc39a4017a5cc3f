// Library search speed: 10,000 generated motifs in one studio, searched through the API as a
// user types, against a plain Postgres ILIKE over the same rows for the same queries.
// `npm run bench -- library`, or standalone: `tsx scripts/bench/library-bench.ts`.
import http from 'node:http';
import os from 'node:os';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import request from 'supertest';
import { createApp } from '../../server/app';
import { parseConfig } from '../../server/config';
import { featureRouters } from '../../server/features/feature-routers';
import { openRuntime, type Runtime } from '../../server/runtime';
import { seedMotifs } from '../../tests/api/support/library-seed';
import { benchMotifs, colourQueries, misspelt, typedQueries } from './library-data';

export type Percentiles = { n: number; p50: number; p95: number; max: number };
export type LibraryBenchResult = {
  motifs: number;
  seedMs: number;
  firstBuildMs: number;
  // Heap growth of the first search, i.e. the studio's in-memory library (rough without --expose-gc).
  indexHeapMb: number;
  refreshAfterEditMs: number;
  typed: Percentiles;
  misspelt: Percentiles;
  colour: Percentiles;
  ilike: Percentiles;
  floor: Percentiles;
  nextPages: Percentiles;
  ratioP95: number;
  misspeltFound: { fuzzy: number; ilike: number };
  pass: boolean;
};

export type LibraryBenchOptions = { runtime?: Runtime; env?: Record<string, string>; motifCount?: number; rounds?: number; log?: (line: string) => void };

// Targets of the library issue: typed queries p95 < 50 ms, colour search p95 < 100 ms.
const TYPED_TARGET_MS = 50;
const COLOUR_TARGET_MS = 100;

function percentiles(samples: number[]): Percentiles {
  const sorted = [...samples].sort((a, b) => a - b);
  // Nearest-rank percentiles.
  const at = (p: number) => sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)];
  return { n: sorted.length, p50: at(50), p95: at(95), max: sorted[sorted.length - 1] };
}

async function timed<T>(fn: () => Promise<T>): Promise<[number, T]> {
  const started = performance.now();
  const value = await fn();
  return [performance.now() - started, value];
}


const ilikeSql = `
  select m.id, m.name, count(*) over () as total
  from motifs m
  join motif_versions v on v.motif_id = m.id and v.version = m.current_version
  join originals o on o.id = m.original_id
  where m.studio_id = $1 and not m.archived
    and (m.name ilike $2 or array_to_string(m.tags, ' ') ilike $2 or m.source_path ilike $2 or o.name ilike $2 or m.notes ilike $2)
  order by m.created_at desc
  limit 100`;

const shade = (hex: string, round: number) => `#${[1, 3, 5].map((i) => Math.min(255, Number.parseInt(hex.slice(i, i + 2), 16) + round).toString(16).padStart(2, '0')).join('')}`;

const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

export async function benchLibrary(options: LibraryBenchOptions = {}): Promise<LibraryBenchResult> {
  const log = options.log ?? console.log;
  const motifCount = options.motifCount ?? 10_000;
  const rounds = options.rounds ?? 3;
  const runtime = options.runtime ?? (await openRuntime(parseConfig({ ...process.env, NODE_ENV: 'test', RATE_LIMIT_SIGN_UP: '1000', ...options.env })));
  const app = createApp({ ...runtime, extraRouters: (shared) => featureRouters(runtime, shared) });
  const server = http.createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  try {
    const agent = request.agent(`http://127.0.0.1:${(server.address() as AddressInfo).port}`);
    const csrf = (await agent.get('/api/auth/csrf')).body.csrfToken as string;
    const signUp = await agent
      .post('/api/auth/sign-up')
      .set('x-csrf-token', csrf)
      .send({ name: 'Ines Okafor', email: `bench-library-${Date.now()}@saltmarsh.test`, password: 'puffins-in-jumpers', studioName: 'Saltmarsh Bench' });
    if (signUp.status !== 201) throw new Error(`bench sign-up failed: ${signUp.status} ${JSON.stringify(signUp.body)}`);
    const studioId = signUp.body.studio.id as string;
    const token = (await agent.get('/api/auth/csrf')).body.csrfToken as string;

    const [seedMs] = await timed(async () => {
      for (const original of benchMotifs(motifCount)) await seedMotifs(runtime.db.db, studioId, original.motifs, { originalName: original.originalName });
    });
    const search = (query: string) => agent.get(`/api/motifs?${query}`).expect(200);
    global.gc?.();
    const heapBefore = process.memoryUsage().heapUsed;
    const [firstBuildMs] = await timed(() => search('q=puffin'));
    global.gc?.();
    const indexHeapMb = (process.memoryUsage().heapUsed - heapBefore) / 1048576;
    const some = (await search('limit=1')).body.motifs[0];
    await agent.patch(`/api/motifs/${some.id}`).set('x-csrf-token', token).send({ notes: 'edited during the bench' }).expect(200);
    const [refreshAfterEditMs] = await timed(() => search('q=puffin'));

    const typed: number[] = [];
    const byLength = new Map<number, number[]>();
    const slips: number[] = [];
    const colours: number[] = [];
    const ilike: number[] = [];
    const floor: number[] = [];
    const found = { fuzzy: 0, ilike: 0 };
    for (let round = 0; round < rounds; round++) {
      // The library remembers its last answers (for paging); a maxDistance that has no effect on
      // word queries but differs per round makes every sample a fresh computation.
      const fresh = `&maxDistance=${12 + round / 1000}`;
      for (const q of typedQueries()) {
        const [ms] = await timed(() => search(`q=${encodeURIComponent(q)}${fresh}`));
        typed.push(ms);
        const letters = Math.min(q.length, 4);
        byLength.set(letters, [...(byLength.get(letters) ?? []), ms]);
      }
      for (const q of misspelt) {
        const [ms, res] = await timed(() => search(`q=${encodeURIComponent(q)}${fresh}`));
        slips.push(ms);
        if (round === 0 && res.body.total > 0) found.fuzzy++;
      }
      // A different shade each round: the library keeps its last few colour answers, and this
      // measures the first time a colour is asked.
      for (const hex of colourQueries) colours.push((await timed(() => search(`colour=${encodeURIComponent(shade(hex, round))}`)))[0]);
      // The same session and role checks around a one-row read: what any API answer costs here.
      for (let i = 0; i < 20; i++) floor.push((await timed(() => agent.get('/api/studio').expect(200)))[0]);
      for (const q of [...typedQueries(), ...misspelt]) {
        const [ms, res] = await timed(() => runtime.db.pool.query(ilikeSql, [studioId, likePattern(q)]));
        ilike.push(ms);
        if (round === 0 && misspelt.includes(q) && res.rowCount) found.ilike++;
      }
    }
    // Scrolling: the next pages of a query already asked.
    const pages: number[] = [];
    for (const q of ['lantern', 'puffin', 'coastal spring', 'c']) {
      for (let offset = 100; offset <= 500; offset += 100) pages.push((await timed(() => search(`q=${encodeURIComponent(q)}&offset=${offset}`)))[0]);
    }
    const apiAll = percentiles([...typed, ...slips]);
    const result: LibraryBenchResult = {
      motifs: motifCount,
      seedMs,
      firstBuildMs,
      indexHeapMb,
      refreshAfterEditMs,
      typed: percentiles(typed),
      misspelt: percentiles(slips),
      colour: percentiles(colours),
      ilike: percentiles(ilike),
      floor: percentiles(floor),
      nextPages: percentiles(pages),
      ratioP95: apiAll.p95 / percentiles(ilike).p95,
      misspeltFound: found,
      pass: apiAll.p95 < TYPED_TARGET_MS && percentiles(colours).p95 < COLOUR_TARGET_MS,
    };
    printTable(result, log);
    log(`typed p95 by letters typed: ${[...byLength].sort((a, b) => a[0] - b[0]).map(([n, v]) => `${n === 4 ? '4+' : n}: ${percentiles(v).p95.toFixed(1)} ms`).join(', ')}`);
    return result;
  } finally {
    await new Promise((resolve) => server.close(resolve));
    if (!options.runtime) await runtime.close();
  }
}

function printTable(r: LibraryBenchResult, log: (line: string) => void) {
  const ms = (v: number) => `${v.toFixed(1)} ms`.padStart(9);
  const row = (label: string, p: Percentiles, target = '') => log(`${label.padEnd(34)}${String(p.n).padStart(5)}${ms(p.p50)}${ms(p.p95)}${ms(p.max)}  ${target}`);
  const verdict = (p: Percentiles, limit: number) => `< ${limit} ms ${p.p95 < limit ? 'ok' : 'MISSED'}`;
  log(`machine load average ${os.loadavg().map((l) => l.toFixed(1)).join(' / ')} on ${os.cpus().length} cores (1 / 5 / 15 min)`);
  log(`library: ${r.motifs.toLocaleString('en')} motifs seeded in ${Math.round(r.seedMs)} ms; first search (index build) ${Math.round(r.firstBuildMs)} ms, about ${Math.round(r.indexHeapMb)} MB of heap; first search after an edit ${r.refreshAfterEditMs.toFixed(1)} ms`);
  log(`${''.padEnd(34)}${'n'.padStart(5)}${'p50'.padStart(9)}${'p95'.padStart(9)}${'max'.padStart(9)}  target (p95)`);
  row('API, typed prefixes (fuse.js)', r.typed, verdict(r.typed, TYPED_TARGET_MS));
  row('API, misspellings (fuse.js)', r.misspelt, verdict(r.misspelt, TYPED_TARGET_MS));
  row('API, colour (CIEDE2000)', r.colour, verdict(r.colour, COLOUR_TARGET_MS));
  row('API, next pages of a search', r.nextPages);
  row('Postgres ILIKE, same queries', r.ilike);
  row('API floor (GET /api/studio)', r.floor);
  log(`ratio API p95 / ILIKE p95 (text queries): ${r.ratioP95.toFixed(2)}x — the API figure includes HTTP, session and role checks; ILIKE is the bare query`);
  log(`misspellings found: fuse.js ${r.misspeltFound.fuzzy}/${misspelt.length}, ILIKE ${r.misspeltFound.ilike}/${misspelt.length}`);
}

// Standalone: throwaway Postgres, S3 and mail, removed afterwards.
if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const { startTestServices } = await import('../../tests/setup/test-services');
  const services = await startTestServices({ label: 'library-bench' });
  try {
    const result = await benchLibrary({ env: services.env });
    process.exitCode = result.pass ? 0 : 1;
  } finally {
    await services.stop();
  }
}
