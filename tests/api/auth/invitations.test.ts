import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, addMember, createTestApp, signUpOwner, uniqueEmail, type TestApp } from '../support/test-app';
import { linkIn, mailsTo } from '../support/inbox';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function inviteAndGetToken(owner: ApiClient, email: string, role: 'editor' | 'reviewer' = 'editor') {
  const res = await owner.post('/api/studio/invitations', { email, role });
  expect(res.status).toBe(201);
  const mails = await mailsTo(email);
  return linkIn(mails.at(-1)!, /\/invitations\/[A-Za-z0-9_-]+/).split('/').pop()!;
}

describe('invitations', () => {
  it('mails a link that previews the studio, role and inviter', async () => {
    const { client } = await signUpOwner(t.app, 'Lantern & Leaf');
    const email = uniqueEmail('teodor');
    const token = await inviteAndGetToken(client, email, 'reviewer');
    const preview = await new ApiClient(t.app).get(`/api/invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({ studioName: 'Lantern & Leaf', email, role: 'reviewer', invitedBy: 'Ines Okafor', accountExists: false });
  });

  it('escapes the studio name in the invitation mail', async () => {
    const { client } = await signUpOwner(t.app, '<b>Bold</b> Studio');
    const email = uniqueEmail('escape');
    await client.post('/api/studio/invitations', { email, role: 'editor' });
    const [mail] = await mailsTo(email);
    expect(mail.html).toContain('&lt;b&gt;Bold&lt;/b&gt; Studio');
    expect(mail.html).not.toContain('<b>Bold</b>');
  });

  it('lets a new person accept with a name and password, signed in as that studio\'s editor', async () => {
    const { client: owner } = await signUpOwner(t.app);
    const email = uniqueEmail('new');
    const token = await inviteAndGetToken(owner, email);
    const guest = new ApiClient(t.app);
    const res = await guest.post(`/api/invitations/${token}/accept`, { name: 'Teodor Vance', password: 'knitted-jumper-9' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('editor');
    expect((await guest.get('/api/auth/me')).body.user.email).toBe(email);
    const members = await owner.get('/api/studio/members');
    expect(members.body.members.map((m: { email: string }) => m.email)).toContain(email);
    expect(members.body.invitations).toHaveLength(0);
  });

  it('lets an existing account join a second studio and switch between them', async () => {
    const first = await signUpOwner(t.app, 'First Studio');
    const second = await signUpOwner(t.app, 'Second Studio');
    const token = await inviteAndGetToken(second.client, first.email, 'reviewer');
    const preview = await new ApiClient(t.app).get(`/api/invitations/${token}`);
    expect(preview.body.accountExists).toBe(true);
    const wrong = await new ApiClient(t.app).post(`/api/invitations/${token}/accept`, { password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    const res = await first.client.post(`/api/invitations/${token}/accept`, {});
    expect(res.status).toBe(200);
    expect(res.body.studios.map((s: { name: string }) => s.name).sort()).toEqual(['First Studio', 'Second Studio']);
    const switched = await first.client.post('/api/auth/switch-studio', { studioId: second.me.studio.id });
    expect(switched.body.studio.name).toBe('Second Studio');
    expect(switched.body.role).toBe('reviewer');
    expect((await first.client.get('/api/studio')).body.name).toBe('Second Studio');
  });

  it('refuses to switch to a studio the user does not belong to', async () => {
    const a = await signUpOwner(t.app);
    const b = await signUpOwner(t.app);
    const res = await a.client.post('/api/auth/switch-studio', { studioId: b.me.studio.id });
    expect(res.status).toBe(404);
  });

  it('refuses to invite someone who is already a member', async () => {
    const { client, email } = await signUpOwner(t.app);
    const res = await client.post('/api/studio/invitations', { email, role: 'editor' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('invitation.already_member');
  });

  it('works once: a used link answers that it was used', async () => {
    const { client: owner } = await signUpOwner(t.app);
    const email = uniqueEmail('once');
    const token = await inviteAndGetToken(owner, email);
    await new ApiClient(t.app).post(`/api/invitations/${token}/accept`, { name: 'A', password: 'long-password-1' }).then((r) => expect(r.status).toBe(200));
    const again = await new ApiClient(t.app).post(`/api/invitations/${token}/accept`, { name: 'B', password: 'long-password-2' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invitation.used');
  });

  it('stops a revoked link from working', async () => {
    const { client: owner } = await signUpOwner(t.app);
    const email = uniqueEmail('revoked');
    const token = await inviteAndGetToken(owner, email);
    const { body } = await owner.get('/api/studio/members');
    expect((await owner.delete(`/api/studio/invitations/${body.invitations[0].id}`)).status).toBe(204);
    const res = await new ApiClient(t.app).get(`/api/invitations/${token}`);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe('invitation.revoked');
  });

  it('refuses an accept from someone signed in as another address', async () => {
    const { client: owner } = await signUpOwner(t.app);
    const stranger = await signUpOwner(t.app);
    const token = await inviteAndGetToken(owner, uniqueEmail('target'));
    const res = await stranger.client.post(`/api/invitations/${token}/accept`, {});
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('invitation.other_account');
  });

  it('answers an unknown token with 404', async () => {
    const res = await new ApiClient(t.app).get(`/api/invitations/${'x'.repeat(43)}`);
    expect(res.status).toBe(404);
  });
});

describe('members', () => {
  it('lets the owner change a role and remove a member', async () => {
    const owner = await signUpOwner(t.app);
    const editor = await addMember(t.app, owner.client, 'editor');
    const changed = await owner.client.patch(`/api/studio/members/${editor.userId}`, { role: 'reviewer' });
    expect(changed.status).toBe(200);
    expect((await editor.client.get('/api/auth/me')).body.role).toBe('reviewer');
    expect((await owner.client.delete(`/api/studio/members/${editor.userId}`)).status).toBe(204);
    const me = await editor.client.get('/api/auth/me');
    expect(me.body.studio).toBeNull();
    expect((await editor.client.get('/api/studio')).status).toBe(403);
  });

  it('keeps at least one owner', async () => {
    const owner = await signUpOwner(t.app);
    const demote = await owner.client.patch(`/api/studio/members/${owner.me.user.id}`, { role: 'editor' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('members.last_owner');
    const remove = await owner.client.delete(`/api/studio/members/${owner.me.user.id}`);
    expect(remove.status).toBe(409);
  });
});
