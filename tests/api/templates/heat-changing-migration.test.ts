import { readFileSync } from 'node:fs';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import type { Template } from '../../../shared/templates';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;

const migration = readFileSync(new URL('../../../drizzle/0007_heat_changing_hides_print.sql', import.meta.url), 'utf8');

beforeAll(async () => {
  t = await createTestApp();
  owner = (await signUpOwner(t.app, 'Harbour Mugs')).client;
}, 60_000);
afterAll(() => t.close());

const variantsOf = async (id: string) => {
  const list = await owner.get('/api/templates').expect(200);
  return (list.body.templates.find((e: { template: Template }) => e.template.id === id).template as Template).variants;
};

describe('migration 0007: heat-changing variants of copied templates', () => {
  it('marks the cold heat-changing variant of a template copied before the flag as hiding the print, once', async () => {
    const { id: _id, ...spec } = mug11oz;
    // as a copy made before variants carried the flag
    const old = { ...spec, name: 'Harbour 11 oz', variants: spec.variants.map(({ hidesPrint: _h, ...v }) => v) };
    const created = await owner.post('/api/templates', { template: old });
    expect(created.status).toBe(201);
    expect((await variantsOf(created.body.id)).some((v) => v.hidesPrint)).toBe(false);
    // one whose owner said otherwise keeps its word
    const said = await owner.post('/api/templates', { template: { ...old, name: 'Harbour 11 oz, cold shows', variants: old.variants.map((v) => (v.id === 'heat-changing-cold' ? { ...v, hidesPrint: false } : v)) } });
    expect(said.status).toBe(201);

    await t.runtime.db.db.execute(sql.raw(migration));
    await t.runtime.db.db.execute(sql.raw(migration));

    const after = await variantsOf(created.body.id);
    expect(after.map((v) => v.id)).toEqual(old.variants.map((v) => v.id));
    expect(after.filter((v) => v.hidesPrint).map((v) => v.id)).toEqual(['heat-changing-cold']);
    expect((await variantsOf(said.body.id)).find((v) => v.id === 'heat-changing-cold')?.hidesPrint).toBe(false);
  });
});
