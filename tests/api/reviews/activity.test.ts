import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { activityEvents } from '../../../server/db/schema/index';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { smallCardPsd } from '../support/psd-files';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { waitForImport } from '../support/wait-for';

let t: TestApp;
let owner: ApiClient;
let editor: { client: ApiClient; userId: string };
let reviewer: { client: ApiClient; userId: string };
let studioId: string;
let productId: string;

type Page = { events: { kind: string; summary: string; actor: { id: string; name: string } | null }[]; nextBefore: string | null };

beforeAll(async () => {
  t = await createTestApp({}, { workers: true });
  const signedUp = await signUpOwner(t.app, 'Feed Studio');
  owner = signedUp.client;
  studioId = signedUp.me.studio.id;
  editor = await addMember(t.app, owner, 'editor');
  reviewer = await addMember(t.app, owner, 'reviewer');
  productId = (await editor.client.post('/api/products', { name: 'Puffin Picnic mug', templateId: mug11oz.id })).body.id;
  const thread = (await reviewer.client.post(`/api/products/${productId}/threads`, { body: 'Jumper stripes clash' })).body;
  await editor.client.post(`/api/threads/${thread.id}/resolve`);
  await editor.client.post(`/api/products/${productId}/review-requests`, { note: '' });
  await reviewer.client.post(`/api/products/${productId}/decisions`, { decision: 'approved' });
}, 90_000);
afterAll(() => t.close());

describe('the studio activity feed', () => {
  it('lists comments and reviews newest first, with the actors’ names', async () => {
    const res = await reviewer.client.get('/api/activity').expect(200);
    const page = res.body as Page;
    expect(page.events.map((e) => e.kind)).toEqual(['review.approved', 'review.requested', 'comment.resolved', 'comment.added', 'product.created']);
    expect(page.events[0]).toMatchObject({ actor: { name: 'June Abara' }, summary: 'approved “Puffin Picnic mug”' });
    expect(page.nextBefore).toBeNull();
  });

  it('filters by person and by kind', async () => {
    const byJune = (await owner.get(`/api/activity?actor=${reviewer.userId}`).expect(200)).body as Page;
    expect(byJune.events.map((e) => e.kind)).toEqual(['review.approved', 'comment.added']);
    const resolved = (await owner.get('/api/activity?kind=comment.resolved').expect(200)).body as Page;
    expect(resolved.events).toEqual([expect.objectContaining({ actor: { id: editor.userId, name: 'Teodor Vance' } })]);
    const both = (await owner.get(`/api/activity?actor=${editor.userId}&kind=review.approved`).expect(200)).body as Page;
    expect(both.events).toEqual([]);
    const bad = await owner.get('/api/activity?kind=gossip');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.kind).toBeDefined();
  });

  it('pages by time, keeping events of one instant apart', async () => {
    // three events with the very same time, as one transaction writes them
    const at = new Date('2026-01-05T10:00:00.000Z');
    await t.runtime.db.db.insert(activityEvents).values(
      ['a', 'b', 'c'].map((n) => ({ studioId, actorId: null, kind: 'sales.imported', subjectType: 'sales_import', subjectId: null, summary: `import ${n}`, createdAt: at })),
    );
    const seen: string[] = [];
    let before: string | null = null;
    for (let i = 0; i < 10; i++) {
      const page: Page = (await owner.get(`/api/activity?kind=sales.imported&limit=2${before ? `&before=${before}` : ''}`).expect(200)).body;
      seen.push(...page.events.map((e) => e.summary));
      before = page.nextBefore;
      if (!before) break;
    }
    expect(seen.sort()).toEqual(['import a', 'import b', 'import c']);
    const olderThan = (await owner.get('/api/activity?before=2026-01-05T10:00:00.001Z&kind=sales.imported').expect(200)).body as Page;
    expect(olderThan.events).toHaveLength(3);
    const none = (await owner.get('/api/activity?before=2026-01-05T10:00:00.000Z&kind=sales.imported').expect(200)).body as Page;
    expect(none.events).toEqual([]);
  });

  it('lists an import once it has committed, by the person who uploaded it', async () => {
    const upload = await editor.client.upload('/api/originals', smallCardPsd(), 'puffin-picnic.psd');
    expect(upload.status).toBe(202);
    await waitForImport(editor.client, upload.body.id, 50_000);
    const page = (await owner.get('/api/activity?kind=original.imported').expect(200)).body as Page;
    expect(page.events).toEqual([expect.objectContaining({ actor: { id: editor.userId, name: 'Teodor Vance' }, summary: expect.stringMatching(/^imported “.+”: \d+ new motifs?, 0 new versions$/) })]);
  }, 60_000);

  it('shows another studio none of it', async () => {
    const other = (await signUpOwner(t.app, 'Quiet Cove Studio')).client;
    const page = (await other.get(`/api/activity?actor=${reviewer.userId}`).expect(200)).body as Page;
    expect(page.events).toEqual([]);
  });
});
