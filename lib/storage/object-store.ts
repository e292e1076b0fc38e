import 'server-only';
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { serverEnv } from '@/lib/env';
import { AppError } from '@/lib/errors';

let client: S3Client | undefined;

function s3(): S3Client {
  const env = serverEnv();
  client ??= new S3Client({
    region: env.S3_REGION,
    endpoint: env.S3_ENDPOINT,
    // The local fake and most S3-compatible stores answer only path-style addresses.
    forcePathStyle: true,
    // Checksums on every request are an AWS extension that S3-compatible stores do not all understand.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  return client;
}

function unavailable(error: unknown): AppError {
  console.error('[airproof] object storage failed', error);
  return new AppError('unavailable', 'storage', 'File storage is not answering; try again in a moment');
}

/** Stores one object under `key` in the configured bucket, replacing any object already there. */
export async function putObject({ key, body, contentType }: { key: string; body: Uint8Array; contentType: string }): Promise<void> {
  try {
    await s3().send(new PutObjectCommand({ Bucket: serverEnv().S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
  } catch (error) {
    throw unavailable(error);
  }
}

/** The bytes stored under `key` as a stream; `not_found:object` when there are none. */
export async function getObject(key: string): Promise<ReadableStream<Uint8Array<ArrayBuffer>>> {
  let body;
  try {
    ({ Body: body } = await s3().send(new GetObjectCommand({ Bucket: serverEnv().S3_BUCKET, Key: key })));
  } catch (error) {
    if (error instanceof NoSuchKey) throw missing();
    throw unavailable(error);
  }
  if (!body) throw missing();
  return body.transformToWebStream();
}

/** Removes the object under `key`; removing one that is not there is not an error (S3 answers the same). */
export async function deleteObject(key: string): Promise<void> {
  try {
    await s3().send(new DeleteObjectCommand({ Bucket: serverEnv().S3_BUCKET, Key: key }));
  } catch (error) {
    throw unavailable(error);
  }
}

function missing(): AppError {
  return new AppError('not_found', 'object', 'The stored file is missing');
}
