import { GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import nodemailer from 'nodemailer';
import pg from 'pg';
import { Readable } from 'node:stream';
import { describe, expect, inject, it } from 'vitest';
import { readInbox, waitForMail } from '../../scripts/services/fake-mail';
import '../setup/provided-context';

// The local services every API test relies on, checked through the same client libraries the server uses.
describe('test services', () => {
  it('give each test run its own PostgreSQL 15 database on loopback', async () => {
    const databaseUrl = inject('databaseUrl');
    expect(process.env.DATABASE_URL).toBe(databaseUrl);
    expect(new URL(databaseUrl).hostname).toBe('127.0.0.1');
    const client = new pg.Client({ connectionString: databaseUrl });
    await client.connect();
    try {
      const { rows } = await client.query<{ version: string; db: string; fsync: string }>(
        "SELECT current_setting('server_version') AS version, current_database() AS db, current_setting('fsync') AS fsync",
      );
      expect(rows[0].version).toMatch(/^15\./);
      expect(rows[0].db).toBe('motifold_test');
      expect(rows[0].fsync).toBe('off');
    } finally {
      await client.end();
    }
  });

  it('store a streamed object byte for byte and read it back', async () => {
    const s3 = new S3Client({
      endpoint: inject('s3Endpoint'),
      region: 'us-east-1',
      forcePathStyle: true,
      credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
    // PNG signature (PNG spec, section 5.2) followed by bytes 0..255: a binary body that
    // chunked-encoding framing would visibly corrupt
    const body = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.from([...Array(256).keys()])]);
    const Bucket = inject('s3Bucket');
    await s3.send(
      new PutObjectCommand({ Bucket, Key: 'harness/sample.bin', Body: Readable.from([body]), ContentLength: body.length }),
    );
    const stored = await s3.send(new GetObjectCommand({ Bucket, Key: 'harness/sample.bin' }));
    const bytes = Buffer.from(await stored.Body!.transformToByteArray());
    expect(bytes.equals(body)).toBe(true);
    s3.destroy();
  });

  it('catch outgoing mail and show it in the inbox', async () => {
    const smtp = new URL(inject('smtpUrl'));
    const transport = nodemailer.createTransport({ host: smtp.hostname, port: Number(smtp.port), secure: false, ignoreTLS: true });
    const subject = `Harness check ${Date.now()}`;
    await transport.sendMail({ from: 'no-reply@motifold.test', to: 'june@saltmarsh.test', subject, text: 'The tote proof is ready.' });
    transport.close();
    const mail = await waitForMail(inject('inboxUrl'), (m) => m.subject === subject);
    expect(mail.to.map((to) => to.address)).toEqual(['june@saltmarsh.test']);
    expect(mail.text?.trim()).toBe('The tote proof is ready.');
    expect((await readInbox(inject('inboxUrl'))).length).toBeGreaterThanOrEqual(1);
  });
});
