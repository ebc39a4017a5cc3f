import { mkdir } from 'node:fs/promises';
import path from 'node:path';
import S3rver from 's3rver';
import { ServiceError } from './service-error';

export interface FakeS3Options {
  directory: string;
  /** 0 picks a free port. */
  port: number;
  bucket: string;
}

export interface RunningFakeS3 {
  endpoint: string;
  stop(): Promise<void>;
}

// Clients must use forcePathStyle and requestChecksumCalculation/responseChecksumValidation
// 'WHEN_REQUIRED': with the SDK defaults a streamed PutObject stores the chunked framing bytes.
export async function startFakeS3(options: FakeS3Options): Promise<RunningFakeS3> {
  const directory = path.resolve(options.directory);
  await mkdir(directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: options.port,
    directory,
    silent: true,
    configureBuckets: [{ name: options.bucket, configs: [] }],
  });
  let address: { port: number };
  try {
    address = await server.run();
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      throw new ServiceError(
        's3.port_taken',
        `port ${options.port} for the local object storage is already in use (is another \`npm start\` or \`npm run dev\` running?); stop it, or set S3_ENDPOINT to use that storage`,
      );
    }
    throw error;
  }
  let stopped = false;
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    async stop() {
      if (stopped) return;
      stopped = true;
      await server.close();
    },
  };
}
