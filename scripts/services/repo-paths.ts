import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = path.resolve(fileURLToPath(new URL('../..', import.meta.url)));
export const storageRoot = path.join(repoRoot, 'storage');

// Run the CLIs with this Node directly: no dependence on PATH or npx.
export const tsxCli = path.join(repoRoot, 'node_modules', 'tsx', 'dist', 'cli.mjs');
export const viteCli = path.join(repoRoot, 'node_modules', 'vite', 'bin', 'vite.js');
export const vitestCli = path.join(repoRoot, 'node_modules', 'vitest', 'vitest.mjs');
