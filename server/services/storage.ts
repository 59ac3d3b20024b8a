// Object storage for uploaded files, through the S3 API: the fake server in development and tests,
// a real object store in production (bucket and endpoint from configuration).
import {
  DeleteObjectCommand,
  GetObjectCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { env } from '../config/env';
import { HttpError, notFound } from '../errors';

// The SDK version is pinned and the project runs on Node 20 (see package.json engines): skip its upgrade notice.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

const client = new S3Client({
  region: env.S3_REGION,
  endpoint: env.S3_ENDPOINT,
  forcePathStyle: env.S3_FORCE_PATH_STYLE,
  credentials:
    env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
      ? { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY }
      : undefined,
  // Checksums only where the API requires them: self-hosted stores differ in which flexible checksums they know.
  requestChecksumCalculation: 'WHEN_REQUIRED',
  responseChecksumValidation: 'WHEN_REQUIRED',
  maxAttempts: 3,
});

const unavailable = () =>
  new HttpError('storage_unavailable', 'File storage is not answering. Nothing was saved; try again in a moment.');

/** Stores bytes under a key; the key is ours (see attachments), never the client's file name. */
export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  try {
    await client.send(new PutObjectCommand({ Bucket: env.S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
  } catch (err) {
    throw storageError(err);
  }
}

/** Reads a whole object (uploads are capped at a few MB, so buffering is fine). */
export async function getObject(key: string): Promise<Buffer> {
  try {
    const out = await client.send(new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
    if (!out.Body) throw notFound('This file');
    return Buffer.from(await out.Body.transformToByteArray());
  } catch (err) {
    throw storageError(err);
  }
}

/** Deletes an object; one already gone counts as deleted. */
export async function deleteObject(key: string): Promise<void> {
  try {
    await client.send(new DeleteObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
  } catch (err) {
    throw storageError(err);
  }
}

function storageError(err: unknown): Error {
  if (err instanceof HttpError) return err;
  if (err instanceof S3ServiceException && (err.name === 'NoSuchKey' || err.$metadata.httpStatusCode === 404)) {
    return notFound('This file');
  }
  return unavailable();
}
