import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { routeRegistry } from '../../server/lib/routes';
import { createTestApp } from './support/test-app';

describe('docs/api.md', () => {
  it('lists every route the server answers', async () => {
    const t = await createTestApp();
    try {
      expect(createApp).toBeTypeOf('function');
      const doc = readFileSync(new URL('../../docs/api.md', import.meta.url), 'utf8');
      const missing = routeRegistry
        .map((r) => `${r.method.toUpperCase()} ${r.path}`)
        .filter((line) => !doc.includes(`\`${line}\``));
      expect(missing).toEqual([]);
    } finally {
      await t.close();
    }
  });
});
