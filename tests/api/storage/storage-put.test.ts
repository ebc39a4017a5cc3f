import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { Readable } from 'node:stream';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';

// The object store keeps bytes exactly as sent, whichever way they went up: a buffer, a file
// stream of known length (one request) or a stream of unknown length (multipart, in parts).
let t: TestApp;
let dir: string;
const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');

beforeAll(async () => {
  t = await createTestApp();
  dir = await mkdtemp(path.join(os.tmpdir(), 'motifold-storage-'));
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
  await t?.close();
});

describe('object storage put', () => {
  it('stores a file stream of known length byte for byte', async () => {
    const bytes = randomBytes(3 * 1024 * 1024 + 17);
    const file = path.join(dir, 'known.bin');
    await writeFile(file, bytes);
    const key = `tests/storage/${randomUUID()}/known`;
    await t.runtime.storage.put(key, createReadStream(file), 'application/octet-stream', { contentLength: bytes.length });
    const back = await t.runtime.storage.getBuffer(key);
    expect(back.length).toBe(bytes.length);
    expect(sha(back)).toBe(sha(bytes));
    await t.runtime.storage.remove([key]);
  });

  it('stores a stream of unknown length through parts', async () => {
    // larger than one 5 MiB part, so the upload really is split
    const bytes = randomBytes(6 * 1024 * 1024 + 5);
    const key = `tests/storage/${randomUUID()}/unknown`;
    await t.runtime.storage.put(key, Readable.from([bytes.subarray(0, 1000), bytes.subarray(1000)]), 'application/octet-stream');
    const back = await t.runtime.storage.getBuffer(key);
    expect(sha(back)).toBe(sha(bytes));
    await t.runtime.storage.remove([key]);
  });
});
