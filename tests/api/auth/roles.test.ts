import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, permissions, studioRoles, type StudioRole } from '../../../shared/auth/permissions';
import { routeRegistry } from '../../../server/lib/routes';
import { addMember, ApiClient, createTestApp, signUpOwner, type TestApp } from '../support/test-app';

let t: TestApp;
const clients = {} as Record<StudioRole, ApiClient>;

beforeAll(async () => {
  t = await createTestApp();
  const owner = await signUpOwner(t.app, 'Role Matrix Studio');
  clients.owner = owner.client;
  clients.editor = (await addMember(t.app, owner.client, 'editor')).client;
  clients.reviewer = (await addMember(t.app, owner.client, 'reviewer')).client;
}, 60_000);
afterAll(() => t.close());

// Ids that belong to nobody: handlers answer 404/400, which still proves the guard let us in.
const concrete = (path: string) => path.replace(/:[a-zA-Z]+/g, () => randomUUID());

describe('the role table, route by route', () => {
  it('gives every route of the API a declared access rule', () => {
    expect(routeRegistry.length).toBeGreaterThan(15);
    for (const route of routeRegistry) expect(['public', 'signed-in', ...permissions]).toContain(route.access);
  });

  it('uses every permission of the table on at least one route', () => {
    const used = new Set(routeRegistry.map((r) => r.access));
    for (const p of permissions) expect(used).toContain(p);
  });

  for (const role of studioRoles) {
    it(`lets ${role}s through exactly the routes the table allows`, async () => {
      const guarded = routeRegistry.filter((r) => r.access !== 'public' && r.access !== 'signed-in');
      for (const route of guarded) {
        const path = concrete(route.path);
        const res = route.method === 'get' ? await clients[role].get(path) : await clients[role].send(route.method as 'post', path, {});
        const refused = res.status === 403 && res.body.error?.code === 'role.forbidden';
        expect({ route: `${route.method} ${route.path}`, refused }).toEqual({ route: `${route.method} ${route.path}`, refused: !can(role, route.access as never) });
      }
    }, 60_000);
  }

  it('refuses every studio route to someone signed out', async () => {
    const anonymous = new ApiClient(t.app);
    for (const route of routeRegistry.filter((r) => r.access !== 'public')) {
      const path = concrete(route.path);
      const res = route.method === 'get' ? await anonymous.get(path) : await anonymous.send(route.method as 'post', path, {});
      expect({ route: route.path, status: res.status }).toEqual({ route: route.path, status: 401 });
    }
  });
});

describe('studio isolation', () => {
  it('answers 404 for another studio\'s member, never 403 with details', async () => {
    const other = await signUpOwner(t.app, 'Another Coast Studio');
    const members = await clients.owner.get('/api/studio/members').expect(200);
    const someoneElse = members.body.members.find((m: { role: string }) => m.role === 'editor');
    const res = await other.client.patch(`/api/studio/members/${someoneElse.userId}`, { role: 'reviewer' });
    expect(res.status).toBe(404);
    expect(JSON.stringify(res.body)).not.toContain(someoneElse.email);
  });
});
