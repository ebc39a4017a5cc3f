import { describe, expect, it } from 'vitest';
import { parseConfig } from './config';

describe('configuration', () => {
  it('has safe local defaults', () => {
    const c = parseConfig({});
    expect(c.PORT).toBe(3000);
    expect(c.HOST).toBe('127.0.0.1');
    expect(c.UPLOAD_LIMIT_BYTES).toBe(1024 ** 3);
    expect(c.appUrl).toBe('http://127.0.0.1:3000');
  });

  it('names the bad variable and why', () => {
    expect(() => parseConfig({ PORT: 'ninety' })).toThrow(/PORT/);
    expect(() => parseConfig({ DATABASE_URL: 'not a url' })).toThrow(/DATABASE_URL/);
  });

  it('refuses to run in production without a session secret', () => {
    expect(() => parseConfig({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET is required/);
  });
});
