import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashToken } from '../../../server/lib/tokens';
import { ApiClient, createTestApp, signUpOwner, uniqueEmail, type TestApp } from '../support/test-app';
import { linkIn, mailsTo } from '../support/inbox';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function requestReset(email: string) {
  const res = await new ApiClient(t.app).post('/api/auth/password-reset/request', { email });
  expect(res.status).toBe(202);
  const mails = await mailsTo(email);
  return decodeURIComponent(linkIn(mails.at(-1)!, /token=[^\s]+/).slice('token='.length));
}

describe('password reset by e-mail', () => {
  it('mails a single-use link that sets a new password', async () => {
    const { email } = await signUpOwner(t.app);
    const token = await requestReset(email);
    const client = new ApiClient(t.app);
    expect((await client.post('/api/auth/password-reset/confirm', { token, password: 'a-brand-new-pass' })).status).toBe(204);
    expect((await new ApiClient(t.app).post('/api/auth/sign-in', { email, password: 'a-brand-new-pass' })).status).toBe(200);
    const reused = await new ApiClient(t.app).post('/api/auth/password-reset/confirm', { token, password: 'yet-another-pass' });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe('reset.used');
  });

  it('refuses an expired link and keeps the old password', async () => {
    const { email, password } = await signUpOwner(t.app);
    const token = await requestReset(email);
    await t.runtime.db.pool.query(`update password_resets set expires_at = now() - interval '1 minute' where token_hash = $1`, [hashToken(token)]);
    const res = await new ApiClient(t.app).post('/api/auth/password-reset/confirm', { token, password: 'a-brand-new-pass' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('reset.expired');
    expect((await new ApiClient(t.app).post('/api/auth/sign-in', { email, password })).status).toBe(200);
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    const email = uniqueEmail('ghost');
    const res = await new ApiClient(t.app).post('/api/auth/password-reset/request', { email });
    expect(res.status).toBe(202);
    expect(await mailsTo(email, 500)).toHaveLength(0);
  });

  it('refuses a made-up token', async () => {
    const res = await new ApiClient(t.app).post('/api/auth/password-reset/confirm', { token: 'z'.repeat(43), password: 'a-brand-new-pass' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('reset.invalid_token');
  });
});

describe('rate limits', () => {
  it('slows down repeated sign-in guesses for one address', async () => {
    const limited = await createTestAppWithLimit();
    try {
      const { email } = await signUpOwner(limited.app);
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++) statuses.push((await new ApiClient(limited.app).post('/api/auth/sign-in', { email, password: 'guess-' + i })).status);
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await limited.close();
    }
  });
});

function createTestAppWithLimit() {
  return createTestApp({ RATE_LIMIT_SIGN_IN: '3' });
}
