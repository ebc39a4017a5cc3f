import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { build, type Plugin } from 'esbuild';
import { repoRoot } from '../../../scripts/services/repo-paths';

// Vite's `import url from 'file?url'` (the shipped fonts): here the file becomes a data: URL, so the blank page needs no server.
const assetUrls: Plugin = {
  name: 'asset-urls',
  setup(b) {
    b.onResolve({ filter: /\?url$/ }, async (args) => {
      const found = await b.resolve(args.path.slice(0, -'?url'.length), { resolveDir: args.resolveDir, kind: args.kind });
      if (found.errors.length > 0) return { errors: found.errors };
      return { path: found.path, namespace: 'asset-url' };
    });
    b.onLoad({ filter: /.*/, namespace: 'asset-url' }, async (args) => {
      const type = args.path.endsWith('.woff2') ? 'font/woff2' : args.path.endsWith('.woff') ? 'font/woff' : 'application/octet-stream';
      const data = (await readFile(args.path)).toString('base64');
      return { contents: `export default ${JSON.stringify(`data:${type};base64,${data}`)};`, loader: 'js' };
    });
  },
};

/** The editor's canvas renderer as one browser script (esbuild, as Vite uses it), for page.addScriptTag. */
export async function bundleParityRenderer(): Promise<string> {
  const result = await build({
    entryPoints: [path.join(repoRoot, 'tests', 'e2e', 'support', 'parity-renderer-entry.ts')],
    bundle: true,
    write: false,
    format: 'iife',
    platform: 'browser',
    target: 'es2022',
    alias: { '@shared': path.join(repoRoot, 'shared') },
    plugins: [assetUrls],
    logLevel: 'silent',
  });
  return result.outputFiles[0].text;
}
