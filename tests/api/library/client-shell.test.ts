import type { Express } from 'express';
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { motifPageSearch, readLibraryQuery } from '../../../shared/library/library-address';
import { createApp } from '../../../server/app';
import { parseConfig } from '../../../server/config';
import { featureRouters } from '../../../server/features/feature-routers';
import { openRuntime, type Runtime } from '../../../server/runtime';
import { seedMotifs } from '../support/library-seed';
import { ApiClient, signUpOwner } from '../support/test-app';

// A built client in miniature: the shell, vite's manifest, an entry chunk, the library page's
// chunk and the chunk it imports, with the brotli and gzip copies the build writes.
const entryCode = 'console.log("motifold");\n'.repeat(200);
const indexHtml = `<!doctype html>
<html lang="en">
  <head>
    <title>Motifold</title>
    <script type="module" crossorigin src="/assets/index-abc.js"></script>
    <link rel="stylesheet" crossorigin href="/assets/index-abc.css">
  </head>
  <body><div id="root"></div></body>
</html>
`;
const manifest = {
  'index.html': { file: 'assets/index-abc.js', isEntry: true },
  'src/features/library/routes/loaders.ts': { file: 'assets/loaders-l1.js', imports: ['_motifs-m1.js'], isDynamicEntry: true },
  'src/features/library/routes/library-page.tsx': { file: 'assets/library-page-p1.js', imports: ['index.html', '_motifs-m1.js'], isDynamicEntry: true },
  '_motifs-m1.js': { file: 'assets/motifs-m1.js' },
};

let clientDir: string;
let runtime: Runtime;
let app: Express;

beforeAll(async () => {
  clientDir = await mkdtemp(path.join(os.tmpdir(), 'motifold-client-'));
  await mkdir(path.join(clientDir, 'assets'));
  await mkdir(path.join(clientDir, '.vite'));
  await writeFile(path.join(clientDir, 'index.html'), indexHtml);
  await writeFile(path.join(clientDir, '.vite', 'manifest.json'), JSON.stringify(manifest));
  await writeFile(path.join(clientDir, 'assets', 'index-abc.js'), entryCode);
  await writeFile(path.join(clientDir, 'assets', 'index-abc.js.br'), brotliCompressSync(entryCode));
  await writeFile(path.join(clientDir, 'assets', 'index-abc.js.gz'), gzipSync(entryCode));
  await writeFile(path.join(clientDir, 'motifold-mark.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>');
  const config = parseConfig({ ...process.env, NODE_ENV: 'test', RATE_LIMIT_SIGN_UP: '1000', APP_URL: 'http://motifold.test' });
  runtime = await openRuntime(config);
  app = createApp({ ...runtime, clientDir, extraRouters: (shared) => featureRouters(runtime, shared) });
});
afterAll(async () => {
  await runtime.close();
  await rm(clientDir, { recursive: true, force: true });
});

const linksIn = (html: string) => [...html.matchAll(/<link rel="(preload|modulepreload)"[^>]*href="([^"]+)"/g)].map((m) => `${m[1]} ${m[2].replace(/&amp;/g, '&')}`);

describe('the app shell', () => {
  it('names the library page\'s first data and chunks for the address\'s query, ahead of the app\'s code', async () => {
    const res = await request(app).get('/library?q=puffin&tags=spring&sort=name').set('Cookie', 'motifold.sid=s%3Aabc').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.headers['cache-control']).toBe('no-cache');
    const search = motifPageSearch(readLibraryQuery(new URLSearchParams('q=puffin&tags=spring&sort=name')), 0);
    expect(linksIn(res.text)).toEqual([
      'preload /api/auth/me',
      `preload /api/motifs?${search}`,
      'modulepreload /assets/loaders-l1.js',
      'modulepreload /assets/motifs-m1.js',
      'modulepreload /assets/library-page-p1.js',
    ]);
    // the data is asked for before the entry chunk; the entry chunk is not named twice
    expect(res.text.indexOf('/api/motifs?')).toBeLessThan(res.text.indexOf('/assets/index-abc.js'));
    expect(res.text.match(/index-abc\.js/g)).toHaveLength(1);
  });

  it('names only the session check on other pages and without a session, and nothing on the password reset page', async () => {
    expect(linksIn((await request(app).get('/products').set('Cookie', 'motifold.sid=s%3Aabc').expect(200)).text)).toEqual(['preload /api/auth/me']);
    const signedOut = linksIn((await request(app).get('/library').expect(200)).text);
    expect(signedOut.filter((l) => l.startsWith('preload'))).toEqual(['preload /api/auth/me']);
    expect(linksIn((await request(app).get('/reset-password?token=abc').expect(200)).text)).toEqual([]);
  });

  it('writes an address\'s odd characters into the shell only as escaped URL text', async () => {
    const res = await request(app).get('/library?q=%22%3E%3Cscript%3Ealert(1)%3C/script%3E').set('Cookie', 'motifold.sid=s%3Aabc').expect(200);
    expect(res.text).toContain('/api/motifs?q=%22%3E%3Cscript%3Ealert%281%29%3C%2Fscript%3E');
    expect(res.text).not.toContain('<script>alert');
    expect(res.text.match(/<script/g)).toHaveLength(1);
  });

  it('answers a repeat visit with 304 when the shell has not changed', async () => {
    const first = await request(app).get('/library').expect(200);
    await request(app).get('/library').set('If-None-Match', first.headers.etag).expect(304);
  });
});

describe('static files', () => {
  it('sends hashed chunks as the stored brotli copy, cached for a year, and plain to a client without brotli', async () => {
    const br = await request(app).get('/assets/index-abc.js').set('Accept-Encoding', 'gzip, deflate, br').expect(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['content-type']).toMatch(/javascript/);
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    // the stored copy's bytes went out (the test client unpacks them again)
    expect(Number(br.headers['content-length'])).toBe(brotliCompressSync(entryCode).length);
    expect(br.text).toBe(entryCode);

    const plain = await request(app).get('/assets/index-abc.js').set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.text).toBe(entryCode);
  });

  it('keeps the short cache on files outside assets/, whose names do not change with their content', async () => {
    const res = await request(app).get('/motifold-mark.svg').expect(200);
    expect(res.headers['cache-control']).toBe('public, max-age=3600');
  });
});

describe('compressed API answers', () => {
  it('compresses a library page of JSON for a client that accepts gzip, and sends thumbnails as they are', async () => {
    const { client, me } = await signUpOwner(app, 'Saltmarsh Shell');
    const names = Array.from({ length: 40 }, (_, i) => ({ name: `Puffin picnic piece ${i}`, tags: ['puffin'] }));
    await seedMotifs(runtime.db.db, me.studio.id, names, { originalName: 'puffin-picnic.psd', storage: runtime.storage });
    const list = await client.get('/api/motifs?sort=best&offset=0&limit=120').set('Accept-Encoding', 'gzip').expect(200);
    expect(list.headers['content-encoding']).toBe('gzip');
    expect(list.body.total).toBe(40);

    const thumb = await client.get(list.body.motifs[0].thumbUrl as string).set('Accept-Encoding', 'gzip, br');
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toBe('image/webp');
    expect(thumb.headers['content-encoding']).toBeUndefined();
  });

  it('answers the first page the shell names only to someone signed in', async () => {
    const stranger = new ApiClient(app);
    await stranger.get('/api/motifs?sort=best&offset=0&limit=120').expect(401);
  });
});
