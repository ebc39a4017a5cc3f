import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cardA6, mug11oz } from '../../../shared/templates/built-in-templates';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let editor: ApiClient;
let reviewer: ApiClient;

beforeAll(async () => {
  t = await createTestApp();
  owner = (await signUpOwner(t.app, 'Thread Studio')).client;
  editor = (await addMember(t.app, owner, 'editor')).client;
  reviewer = (await addMember(t.app, owner, 'reviewer')).client;
}, 60_000);
afterAll(() => t.close());

async function newProduct(client: ApiClient, name = 'Puffin Picnic mug', templateId = mug11oz.id) {
  const res = await client.post('/api/products', { name, templateId });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

describe('comment threads on a product', () => {
  it('lets a reviewer pin a comment to the preview, and lists it with the author’s name', async () => {
    const id = await newProduct(editor);
    const res = await reviewer.post(`/api/products/${id}/threads`, { anchor: { surface: 'preview', view: 'front', x: 0.42, y: 0.3 }, body: '  The kite string runs into the handle zone.  ' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ anchor: { surface: 'preview', view: 'front', x: 0.42, y: 0.3 }, resolved: false, productRevision: 1, createdBy: { name: 'June Abara' } });
    expect(res.body.comments).toEqual([expect.objectContaining({ body: 'The kite string runs into the handle zone.', author: expect.objectContaining({ name: 'June Abara' }) })]);
    const list = await owner.get(`/api/products/${id}/threads`).expect(200);
    expect(list.body.threads.map((th: { id: string }) => th.id)).toEqual([res.body.id]);
  });

  it('keeps a comment as plain text: markup is stored as typed, never turned into HTML', async () => {
    const id = await newProduct(editor);
    const body = '<img src=x onerror=alert(1)> & <b>bold</b>';
    const res = await reviewer.post(`/api/products/${id}/threads`, { body });
    expect(res.status).toBe(201);
    expect(res.body.anchor).toBeNull();
    expect(res.body.comments[0].body).toBe(body);
  });

  it('refuses empty and overlong comments and pins off the image, with field errors', async () => {
    const id = await newProduct(editor);
    const empty = await reviewer.post(`/api/products/${id}/threads`, { body: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error).toMatchObject({ code: 'validation.failed', fields: { body: 'Write a comment' } });
    const long = await reviewer.post(`/api/products/${id}/threads`, { body: 'x'.repeat(4001) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.body).toMatch(/4,000/);
    const off = await reviewer.post(`/api/products/${id}/threads`, { anchor: { surface: 'preview', view: 'front', x: 1.2, y: 0.5 }, body: 'Here' });
    expect(off.status).toBe(400);
    expect(off.body.error.fields['anchor.x']).toBeDefined();
    const list = await owner.get(`/api/products/${id}/threads`).expect(200);
    expect(list.body.threads).toEqual([]);
  });

  it('refuses a pin on a view the product does not have', async () => {
    const card = await newProduct(editor, 'Puffin Picnic card', cardA6.id);
    const res = await reviewer.post(`/api/products/${card}/threads`, { anchor: { surface: 'preview', view: 'front', x: 0.5, y: 0.5 }, body: 'Too close to the fold' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('review.unknown_view');
    const flat = await reviewer.post(`/api/products/${card}/threads`, { anchor: { surface: 'preview', view: 'flat', x: 0.5, y: 0.5 }, body: 'Too close to the fold' });
    expect(flat.status).toBe(201);
  });

  it('lets a reviewer reply but not resolve; an editor resolves and reopens', async () => {
    const id = await newProduct(editor);
    const thread = (await reviewer.post(`/api/products/${id}/threads`, { anchor: { surface: 'layout', x: 1200, y: 400 }, body: 'Sandwiches look blurry' })).body;
    const reply = await reviewer.post(`/api/threads/${thread.id}/comments`, { body: 'At 100 % they print soft.' });
    expect(reply.status).toBe(201);
    expect(reply.body.author.name).toBe('June Abara');

    const refused = await reviewer.post(`/api/threads/${thread.id}/resolve`);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('role.forbidden');

    const resolved = await editor.post(`/api/threads/${thread.id}/resolve`);
    expect(resolved.status).toBe(200);
    expect(resolved.body).toMatchObject({ resolved: true, resolvedBy: { name: 'Teodor Vance' } });
    expect(resolved.body.comments).toHaveLength(2);

    const reopened = await owner.post(`/api/threads/${thread.id}/reopen`);
    expect(reopened.body).toMatchObject({ resolved: false, resolvedBy: null, resolvedAt: null });
  });

  it('answers 404 for another studio’s product and thread, and lists nothing of them', async () => {
    const id = await newProduct(editor);
    const thread = (await reviewer.post(`/api/products/${id}/threads`, { body: 'Wave band colour?' })).body;
    const other = (await signUpOwner(t.app, 'Far Shore Studio')).client;
    expect((await other.get(`/api/products/${id}/threads`)).status).toBe(404);
    expect((await other.post(`/api/products/${id}/threads`, { body: 'hello' })).status).toBe(404);
    expect((await other.post(`/api/threads/${thread.id}/comments`, { body: 'hello' })).status).toBe(404);
    expect((await other.post(`/api/threads/${thread.id}/resolve`)).status).toBe(404);
    expect((await other.get(`/api/products/${id}/review`)).status).toBe(404);
    expect((await other.post(`/api/products/${id}/decisions`, { decision: 'approved' })).status).toBe(404);
    const list = await owner.get(`/api/products/${id}/threads`).expect(200);
    expect(list.body.threads[0].comments).toHaveLength(1);
  });
});

describe('review requests and decisions', () => {
  it('lets a reviewer approve and an editor not; the state follows the current revision', async () => {
    const id = await newProduct(editor);
    const editorTry = await editor.post(`/api/products/${id}/decisions`, { decision: 'approved' });
    expect(editorTry.status).toBe(403);

    const asked = await editor.post(`/api/products/${id}/review-requests`, { note: 'Ready for a look' });
    expect(asked.status).toBe(201);
    expect(asked.body.state).toMatchObject({ status: 'requested', openRequest: { note: 'Ready for a look', requestedBy: { name: 'Teodor Vance' }, reviewer: null } });

    const approved = await reviewer.post(`/api/products/${id}/decisions`, { decision: 'approved' });
    expect(approved.status).toBe(201);
    expect(approved.body.state).toMatchObject({ status: 'approved', decision: { reviewer: { name: 'June Abara' }, productRevision: 1 }, openRequest: null });

    // a new save of the layout makes the approval one of an older revision
    const detail = (await editor.get(`/api/products/${id}`)).body;
    const saved = await editor.patch(`/api/products/${id}`, { revision: detail.revision, layout: detail.layout });
    expect(saved.status).toBe(200);
    const after = await reviewer.get(`/api/products/${id}/review`).expect(200);
    expect(after.body).toMatchObject({ revision: 2, state: { status: 'none', decision: null } });
    expect(after.body.decisions).toHaveLength(1);
  });

  it('needs a note to ask for changes, and refuses a reviewer who cannot decide', async () => {
    const id = await newProduct(editor);
    const noNote = await reviewer.post(`/api/products/${id}/decisions`, { decision: 'changes_requested', note: ' ' });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields.note).toBe('Say what should change');
    const badKind = await reviewer.post(`/api/products/${id}/decisions`, { decision: 'maybe' });
    expect(badKind.status).toBe(400);

    const members = (await owner.get('/api/studio/members')).body.members as { userId: string; role: string }[];
    const editorId = members.find((m) => m.role === 'editor')!.userId;
    const wrong = await editor.post(`/api/products/${id}/review-requests`, { reviewerId: editorId, note: '' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.code).toBe('review.not_a_reviewer');
    const review = await owner.get(`/api/products/${id}/review`).expect(200);
    expect(review.body.requests).toEqual([]);
    expect(review.body.reviewers.map((r: { name: string }) => r.name).sort()).toEqual(['Ines Okafor', 'June Abara']);
  });
});
