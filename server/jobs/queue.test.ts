import { describe, expect, it } from 'vitest';
import { retryTransient } from './queue';

// Postgres error codes from the PostgreSQL manual, appendix "PostgreSQL Error Codes":
// 40P01 deadlock_detected, 40001 serialization_failure, 23505 unique_violation.
const pgError = (code: string) => Object.assign(new Error(`pg ${code}`), { code });

describe('retryTransient', () => {
  it('tries again after a deadlock and returns the later result', async () => {
    let calls = 0;
    const result = await retryTransient(async () => {
      calls++;
      if (calls < 3) throw pgError('40P01');
      return 'created';
    });
    expect(result).toBe('created');
    expect(calls).toBe(3);
  });

  it('gives up after the last attempt with the database error', async () => {
    let calls = 0;
    await expect(retryTransient(async () => { calls++; throw pgError('23505'); }, 2)).rejects.toThrow('pg 23505');
    expect(calls).toBe(2);
  });

  it('does not retry an error that is not transient', async () => {
    let calls = 0;
    await expect(retryTransient(async () => { calls++; throw pgError('42P01'); })).rejects.toThrow('pg 42P01');
    expect(calls).toBe(1);
  });
});
