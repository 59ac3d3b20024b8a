// A local stand-in for a hosted object store, used in development and tests: the app's S3 client
// really talks the S3 protocol to it. s3rver keeps objects as files under `directory`.
import S3rver from 's3rver';
import { mkdirSync } from 'node:fs';

/** s3rver's one built-in key pair. */
const FAKE_KEY = 'S3RVER';

export interface FakeS3 {
  port: number;
  /** The S3_* variables that point the app at this server. */
  env: Record<
    'S3_ENDPOINT' | 'S3_BUCKET' | 'S3_REGION' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY' | 'S3_FORCE_PATH_STYLE',
    string
  >;
  close(): Promise<void>;
}

/** Starts the fake store on loopback (port 0: any free port) with the bucket already made. */
export async function startFakeS3(port: number, directory: string, bucket = 'kettlewright-files'): Promise<FakeS3> {
  mkdirSync(directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port,
    directory,
    silent: true,
    configureBuckets: [{ name: bucket }],
  });
  const address = await server.run();
  return {
    port: address.port,
    env: {
      S3_ENDPOINT: `http://127.0.0.1:${address.port}`,
      S3_BUCKET: bucket,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: FAKE_KEY,
      S3_SECRET_ACCESS_KEY: FAKE_KEY,
      S3_FORCE_PATH_STYLE: 'true',
    },
    close: () => server.close(),
  };
}
