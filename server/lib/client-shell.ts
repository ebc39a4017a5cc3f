import type { Request, Response } from 'express';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { motifPageSearch, readLibraryQuery } from '../../shared/library/library-address';

// The built client's index.html, answered for every client-side route. It names, ahead of the
// app's own code, what the page will ask for first: the session check, and for the pages listed
// below their code chunks and first data. The browser then fetches those while the main chunk
// is still loading and running, instead of one after another once the router has started; the
// app's own requests pick the answers up because they ask for the very same URLs.

type ManifestChunk = { file: string; imports?: string[] };
type Manifest = Record<string, ManifestChunk>;

type PagePreload = {
  path: RegExp;
  /** The page's and its loader's modules as the router's lazy imports name them (keys of vite's manifest). */
  modules: string[];
  /** GET requests the page's loader makes first, as absolute paths. */
  data: (url: URL) => string[];
};

const pagePreloads: PagePreload[] = [
  {
    path: /^\/library\/?$/,
    modules: ['src/features/library/routes/loaders.ts', 'src/features/library/routes/library-page.tsx'],
    data: (url) => [`/api/motifs?${motifPageSearch(readLibraryQuery(url.searchParams), 0)}`],
  },
];

// Every page checks the session first, except the password reset, which works signed out.
const asksForSession = (pathname: string) => !pathname.startsWith('/reset-password');

export type ClientShell = (req: Request, res: Response) => void;

/** `sessionCookie`: without it the page's data would only answer 401, so only the session check is named. */
export function createClientShell(clientDir: string, { sessionCookie }: { sessionCookie: string }): ClientShell {
  const html = readFileSync(path.join(clientDir, 'index.html'), 'utf8');
  const manifest = readManifest(clientDir);
  // Data first (the server takes longest over it), then the main chunk, then the page's chunks.
  const headEnd = html.indexOf('</head>');
  const entryAt = html.includes('<script') ? html.indexOf('<script') : headEnd;

  return (req, res) => {
    const url = new URL(req.originalUrl, 'http://shell.invalid');
    const page = pagePreloads.find((p) => p.path.test(url.pathname));
    const signedIn = (req.headers.cookie ?? '').split(';').some((c) => c.trim().startsWith(`${sessionCookie}=`));
    const data = [...(asksForSession(url.pathname) ? ['/api/auth/me'] : []), ...(signedIn && page ? page.data(url) : [])];
    const seen = new Set<string>();
    const chunks = (page?.modules ?? []).flatMap((module) => chunkFiles(manifest, module, seen)).filter((file) => !html.includes(`/${file}"`));
    res.setHeader('Cache-Control', 'no-cache');
    res.type('html').send(
      html.slice(0, entryAt) + data.map(fetchPreload).join('') + html.slice(entryAt, headEnd) + chunks.map(modulePreload).join('') + html.slice(headEnd),
    );
  };
}

// crossorigin: the same credentials mode as the app's fetch(), or the browser will not reuse it
const fetchPreload = (href: string) => `<link rel="preload" as="fetch" crossorigin href="${escapeAttribute(href)}">\n    `;
const modulePreload = (file: string) => `  <link rel="modulepreload" crossorigin href="/${escapeAttribute(file)}">\n  `;

// A chunk and every chunk it imports statically, each once.
function chunkFiles(manifest: Manifest, key: string, seen = new Set<string>()): string[] {
  const chunk = manifest[key];
  if (!chunk || seen.has(key)) return [];
  seen.add(key);
  return [chunk.file, ...(chunk.imports ?? []).flatMap((imported) => chunkFiles(manifest, imported, seen))];
}

// Without a manifest (an older build) the shell still works, only without the page's chunks.
function readManifest(clientDir: string): Manifest {
  const file = path.join(clientDir, '.vite', 'manifest.json');
  if (!existsSync(file)) return {};
  return JSON.parse(readFileSync(file, 'utf8')) as Manifest;
}

const escapeAttribute = (value: string) =>
  value.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
