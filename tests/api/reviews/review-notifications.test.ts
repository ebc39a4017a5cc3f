import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { mailsTo } from '../support/inbox';
import { addMember, ApiClient, createTestApp, signUpOwner, type TestApp } from '../support/test-app';

type Member = { client: ApiClient; email: string; password: string; userId: string };
let t: TestApp;
let owner: ApiClient;
let editor: Member;
let reviewer: Member;
let secondReviewer: Member;

beforeAll(async () => {
  t = await createTestApp();
  owner = (await signUpOwner(t.app, 'Notify Studio')).client;
  editor = await addMember(t.app, owner, 'editor');
  reviewer = await addMember(t.app, owner, 'reviewer');
  secondReviewer = await addMember(t.app, owner, 'reviewer', 'Mara Quill');
}, 90_000);
afterAll(() => t.close());

async function newProduct(client: ApiClient, name: string) {
  const res = await client.post('/api/products', { name, templateId: mug11oz.id });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

// The inbox already holds each member's invitation: wait for the mail about this product.
async function mailAbout(address: string, needle: string, timeoutMs = 5000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await mailsTo(address, 0)).find((m) => m.subject.includes(needle));
    if (found || Date.now() > deadline) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
}

const notificationsOf = async (client: ApiClient) => (await client.get('/api/notifications').expect(200)).body as {
  unreadCount: number;
  notifications: { id: string; kind: string; title: string; link: string; read: boolean }[];
};

describe('review notifications', () => {
  it('mails the chosen reviewer, not the others, with a link to the product', async () => {
    const id = await newProduct(editor.client, 'Coastal Spring tote');
    const res = await editor.client.post(`/api/products/${id}/review-requests`, { reviewerId: reviewer.userId, note: 'Check the puffin colours' });
    expect(res.status).toBe(201);
    const mail = await mailAbout(reviewer.email, 'Coastal Spring tote');
    expect(mail?.subject).toBe('Teodor Vance asked you to review “Coastal Spring tote”');
    expect(mail!.text).toContain(`http://motifold.test/products/${id}#review`);
    expect(mail!.text).toContain('> Check the puffin colours');
    expect((await mailsTo(secondReviewer.email, 300)).map((m) => m.subject)).toEqual([expect.stringMatching(/invited you/)]);
    const mine = await notificationsOf(reviewer.client);
    expect(mine.notifications[0]).toMatchObject({ kind: 'review.requested', link: `/products/${id}#review`, read: false });
    expect((await notificationsOf(secondReviewer.client)).notifications).toEqual([]);
  });

  it('mails the editor who asked when a reviewer decides', async () => {
    const id = await newProduct(owner, 'Lantern Walk mug');
    await editor.client.post(`/api/products/${id}/review-requests`, { note: '' });
    const decided = await reviewer.client.post(`/api/products/${id}/decisions`, { decision: 'changes_requested', note: 'Leaves <b>too</b> dark on the back' });
    expect(decided.status).toBe(201);
    const mail = await mailAbout(editor.email, 'Lantern Walk mug');
    expect(mail?.subject).toBe('June Abara asked for changes to “Lantern Walk mug”');
    expect(mail?.html).toContain('Leaves &lt;b&gt;too&lt;/b&gt; dark');
    // no one is told about their own decision
    const junes = await notificationsOf(reviewer.client);
    expect(junes.notifications.some((n) => n.kind === 'review.decided')).toBe(false);
  });

  it('sends no mail when the member turned mail off, and still notifies in the app', async () => {
    const lane = await addMember(t.app, owner, 'editor', 'Pell Lane');
    const patched = await lane.client.patch('/api/notifications/settings', { notifyByEmail: false });
    expect(patched.body).toEqual({ notifyByEmail: false, notifyInApp: true });
    expect((await lane.client.get('/api/notifications/settings')).body).toEqual({ notifyByEmail: false, notifyInApp: true });

    const id = await newProduct(lane.client, 'Kite sticker sheet');
    await reviewer.client.post(`/api/products/${id}/threads`, { body: 'The kite tail is cut off' });
    const inApp = await notificationsOf(lane.client);
    expect(inApp.notifications).toEqual([expect.objectContaining({ kind: 'comment.added', title: 'June Abara commented on “Kite sticker sheet”' })]);
    expect(await mailAbout(lane.email, 'Kite sticker sheet', 500)).toBeUndefined();
    const [invitation, ...rest] = await mailsTo(lane.email, 500);
    expect(invitation!.subject).toMatch(/invited you/);
    expect(rest).toEqual([]);
    expect((await lane.client.patch('/api/notifications/settings', {})).status).toBe(400);
  });

  it('notifies a thread’s participants of a reply, never its author', async () => {
    const id = await newProduct(owner, 'Wave band card');
    const thread = (await reviewer.client.post(`/api/products/${id}/threads`, { body: 'Band too thin?' })).body;
    await secondReviewer.client.post(`/api/threads/${thread.id}/comments`, { body: 'Agreed' });
    const junes = await notificationsOf(reviewer.client);
    expect(junes.notifications[0]).toMatchObject({ title: 'Mara Quill replied on “Wave band card”', link: `/products/${id}?thread=${thread.id}` });
    const maras = await notificationsOf(secondReviewer.client);
    expect(maras.notifications.some((n) => n.link?.includes(thread.id))).toBe(false);
  });

  it('keeps a comment and its in-app notice when the mail server is down', async () => {
    // a second app on the same database whose mail goes nowhere (port 9 refuses connections)
    const broken = await createTestApp({ SMTP_URL: 'smtp://127.0.0.1:9' });
    try {
      const id = await newProduct(editor.client, 'Sandwich sticker');
      const june = new ApiClient(broken.app);
      expect((await june.post('/api/auth/sign-in', { email: reviewer.email, password: reviewer.password })).status).toBe(200);
      const res = await june.post(`/api/products/${id}/threads`, { body: 'Crusts look grey' });
      expect(res.status).toBe(201);
      const teodors = await notificationsOf(editor.client);
      expect(teodors.notifications[0]).toMatchObject({ title: 'June Abara commented on “Sandwich sticker”' });
      expect(await mailAbout(editor.email, 'Sandwich sticker', 500)).toBeUndefined();
    } finally {
      await broken.close();
    }
  });

  it('marks one or all as read, only one’s own', async () => {
    const id = await newProduct(editor.client, 'Picnic basket print');
    await reviewer.client.post(`/api/products/${id}/threads`, { body: 'One' });
    await reviewer.client.post(`/api/products/${id}/threads`, { body: 'Two' });
    const before = await notificationsOf(editor.client);
    expect(before.unreadCount).toBeGreaterThanOrEqual(2);
    const first = before.notifications[0]!;

    expect((await reviewer.client.post(`/api/notifications/${first.id}/read`)).status).toBe(404);
    expect((await editor.client.post(`/api/notifications/${first.id}/read`)).status).toBe(200);
    const after = await notificationsOf(editor.client);
    expect(after.unreadCount).toBe(before.unreadCount - 1);
    expect(after.notifications.find((n) => n.id === first.id)?.read).toBe(true);

    const all = await editor.client.post('/api/notifications/read-all');
    expect(all.body.marked).toBe(before.unreadCount - 1);
    expect((await notificationsOf(editor.client)).unreadCount).toBe(0);
    // the reviewer's own stay unread
    expect((await notificationsOf(reviewer.client)).unreadCount).toBeGreaterThan(0);
  });
});
