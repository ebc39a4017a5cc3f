import {
  CreateBucketCommand,
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import type { Readable } from 'node:stream';
import type { AppConfig } from '../config';

export type StoredObject = { body: Readable; contentType?: string; contentLength?: number };

export type ObjectStorage = {
  /** A stream whose length is known (a file on disk) may pass it: small enough, it goes up in one request. */
  put(key: string, body: Buffer | Readable, contentType: string, options?: { contentLength?: number }): Promise<void>;
  get(key: string): Promise<StoredObject>;
  getBuffer(key: string): Promise<Buffer>;
  exists(key: string): Promise<boolean>;
  list(prefix: string): Promise<string[]>;
  remove(keys: string[]): Promise<void>;
  check(): Promise<boolean>;
  ensureBucket(): Promise<void>;
};

// A storage that stops answering fails the request instead of holding a job or a page for ever:
// 5 s to connect; 60 s without a byte either way on an open request (an idle time, not a total,
// so a large upload that keeps moving is never cut off). A request that times out is retried by
// the SDK like any other transient fault.
export const S3_TIMEOUTS = { connectionTimeoutMs: 5_000, idleTimeoutMs: 60_000 };

export function createS3Client(
  config: Pick<AppConfig, 'S3_ENDPOINT' | 'S3_REGION' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE'>,
  timeouts: { connectionTimeoutMs: number; idleTimeoutMs: number } = S3_TIMEOUTS,
) {
  return new S3Client({
    endpoint: config.S3_ENDPOINT ?? 'http://127.0.0.1:4568',
    region: config.S3_REGION,
    forcePathStyle: config.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY },
    // Without these the SDK frames streamed bodies in a way S3-compatible fakes store verbatim.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    // socketTimeout is the idle limit on an open socket (requestTimeout would only warn)
    requestHandler: { connectionTimeout: timeouts.connectionTimeoutMs, socketTimeout: timeouts.idleTimeoutMs },
  });
}

// Above this a known-length stream goes up in parts, so one failed part is retried alone; below
// it one request is cheaper than a multipart upload's create, parts and completion (S3's own
// guidance is to consider multipart from about 100 MB: from memory). Measured against the local
// fake with a 96 MB original: 0.5-0.75 s as one request, 1.0-1.3 s as 5 MB parts.
const singlePutLimit = 100 * 1024 * 1024;
// Parts of a multipart upload: fewer, larger requests than the SDK's 5 MB default; 3 in flight
// plus the one being filled hold 64 MB per upload at most. A failed part is retried alone,
// which a single streamed request cannot be (its body is read once).
const PART_BYTES = 16 * 1024 * 1024;
const PARTS_IN_FLIGHT = 3;

export function createStorage(client: S3Client, bucket: string): ObjectStorage {
  return {
    async put(key, body, contentType, options) {
      if (Buffer.isBuffer(body)) {
        await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType }));
        return;
      }
      const length = options?.contentLength;
      if (length !== undefined && length <= singlePutLimit) {
        // One streamed request instead of a multipart upload's three or more round trips.
        await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType, ContentLength: length }));
        return;
      }
      // Streams of unknown length go up in parts, never held whole in memory.
      await new Upload({ client, partSize: PART_BYTES, queueSize: PARTS_IN_FLIGHT, params: { Bucket: bucket, Key: key, Body: body, ContentType: contentType } }).done();
    },
    async get(key) {
      const res = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
      return { body: res.Body as Readable, contentType: res.ContentType, contentLength: res.ContentLength };
    },
    async getBuffer(key) {
      const res = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
      const bytes = await res.Body!.transformToByteArray();
      return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    },
    async exists(key) {
      try {
        await client.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
        return true;
      } catch (err) {
        if ((err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false;
        throw err;
      }
    },
    async list(prefix) {
      const keys: string[] = [];
      let token: string | undefined;
      do {
        const res = await client.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: prefix, ContinuationToken: token }));
        for (const o of res.Contents ?? []) if (o.Key) keys.push(o.Key);
        token = res.IsTruncated ? res.NextContinuationToken : undefined;
      } while (token);
      return keys;
    },
    async remove(keys) {
      for (let i = 0; i < keys.length; i += 1000) {
        const batch = keys.slice(i, i + 1000);
        await client.send(new DeleteObjectsCommand({ Bucket: bucket, Delete: { Objects: batch.map((Key) => ({ Key })) } }));
      }
    },
    async check() {
      try {
        await client.send(new HeadBucketCommand({ Bucket: bucket }));
        return true;
      } catch {
        return false;
      }
    },
    async ensureBucket() {
      try {
        await client.send(new HeadBucketCommand({ Bucket: bucket }));
      } catch {
        await client.send(new CreateBucketCommand({ Bucket: bucket }));
      }
    },
  };
}
