import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, createTestApp, signUpOwner, uniqueEmail, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('signing up and signing in', () => {
  it('creates a studio and makes the new user its owner', async () => {
    const { client, email } = await signUpOwner(t.app, 'Tidepool Prints');
    const me = await client.get('/api/auth/me').expect(200);
    expect(me.body.user.email).toBe(email);
    expect(me.body.studio.name).toBe('Tidepool Prints');
    expect(me.body.role).toBe('owner');
  });

  it('stores the password as an argon2id hash, never in the clear', async () => {
    const { email, password } = await signUpOwner(t.app);
    const { rows } = await t.runtime.db.pool.query('select password_hash from users where email = $1', [email]);
    expect(rows[0].password_hash).toMatch(/^\$argon2id\$/);
    expect(rows[0].password_hash).not.toContain(password);
  });

  it('refuses a second account with the same e-mail, in any letter case', async () => {
    const { email } = await signUpOwner(t.app);
    const res = await new ApiClient(t.app).post('/api/auth/sign-up', { name: 'Someone', email: email.toUpperCase(), password: 'another-long-pass', studioName: 'X' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('auth.email_taken');
  });

  it('names the bad fields of a sign-up', async () => {
    const res = await new ApiClient(t.app).post('/api/auth/sign-up', { name: '', email: 'not-an-address', password: 'short', studioName: 'X' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation.failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'password']);
  });

  it('signs in with the right password and refuses a wrong one with a clear message', async () => {
    const { email, password } = await signUpOwner(t.app);
    const wrong = await new ApiClient(t.app).post('/api/auth/sign-in', { email, password: 'wrong-password' });
    expect(wrong.status).toBe(401);
    expect(wrong.body.error).toEqual({ code: 'auth.invalid_credentials', message: expect.stringContaining('do not match') });
    const client = new ApiClient(t.app);
    const ok = await client.post('/api/auth/sign-in', { email, password });
    expect(ok.status).toBe(200);
    expect(ok.body.role).toBe('owner');
    await client.get('/api/auth/me').expect(200);
  });

  it('answers an unknown address exactly like a wrong password', async () => {
    const res = await new ApiClient(t.app).post('/api/auth/sign-in', { email: uniqueEmail('nobody'), password: 'whatever-it-is' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('auth.invalid_credentials');
  });

  it('gives a new session id at sign-in and forgets the session at sign-out', async () => {
    const { email, password } = await signUpOwner(t.app);
    const client = new ApiClient(t.app);
    const before = (await client.agent.get('/api/auth/csrf')).headers['set-cookie']?.[0] ?? '';
    const signIn = await client.post('/api/auth/sign-in', { email, password });
    const after = signIn.headers['set-cookie']?.[0] ?? '';
    expect(after).toMatch(/^motifold\.sid=/);
    expect(after.split(';')[0]).not.toBe(before.split(';')[0]);
    expect(after).toMatch(/HttpOnly/i);
    expect(after).toMatch(/SameSite=Lax/i);
    expect((await client.post('/api/auth/sign-out')).status).toBe(204);
    const me = await client.get('/api/auth/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('auth.required');
  });

  it('keeps sessions in Postgres so any server process can serve them', async () => {
    const { email } = await signUpOwner(t.app);
    const { rows } = await t.runtime.db.pool.query(`select count(*)::int as n from session where sess->>'userId' = (select id::text from users where email = $1)`, [email]);
    expect(rows[0].n).toBe(1);
  });
});

describe('request guards', () => {
  it('refuses a state-changing request without the CSRF token', async () => {
    const { client } = await signUpOwner(t.app);
    const res = await client.agent.patch('/api/studio').send({ name: 'Hijacked' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf.invalid');
    const settings = await client.get('/api/studio').expect(200);
    expect(settings.body.name).not.toBe('Hijacked');
  });

  it('refuses a CSRF token from another session', async () => {
    const { client } = await signUpOwner(t.app);
    const other = new ApiClient(t.app);
    const foreignToken = await other.csrf();
    const res = await client.agent.patch('/api/studio').set('x-csrf-token', foreignToken).send({ name: 'Hijacked' });
    expect(res.status).toBe(403);
  });

  it('refuses a 20 MB JSON body with 413 and changes nothing', async () => {
    const client = new ApiClient(t.app);
    const email = uniqueEmail('huge');
    const res = await client.post('/api/auth/sign-up', { name: 'x'.repeat(20 * 1024 * 1024), email, password: 'long-enough-pass', studioName: 'Big' });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('request.too_large');
    const { rows } = await t.runtime.db.pool.query('select 1 from users where email = $1', [email]);
    expect(rows).toHaveLength(0);
  });

  it('sets security headers on every answer', async () => {
    const res = await new ApiClient(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('reports database, storage and mail as up', async () => {
    const res = await new ApiClient(t.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok', services: { database: 'up', storage: 'up', mail: 'up' } });
  });

  it('answers an unknown API route with a JSON 404', async () => {
    const res = await new ApiClient(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
