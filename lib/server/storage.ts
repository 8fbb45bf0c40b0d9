import 'server-only';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { env } from './env';

// Object storage for photos. S3_ENDPOINT is where the server reaches storage; S3_PUBLIC_ENDPOINT
// is what the browser reaches for presigned uploads (the same locally, different behind a proxy).
// Checksums only when required: the local fake does not honour the SDK's default checksum headers.
const clients = new Map<string, S3Client>();

function client(endpoint: string | undefined): S3Client {
  const key = endpoint ?? '';
  let c = clients.get(key);
  if (!c) {
    const { S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY } = env();
    c = new S3Client({
      region: S3_REGION,
      endpoint,
      forcePathStyle: true,
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
      credentials: S3_ACCESS_KEY_ID
        ? { accessKeyId: S3_ACCESS_KEY_ID, secretAccessKey: S3_SECRET_ACCESS_KEY ?? '' }
        : undefined,
    });
    clients.set(key, c);
  }
  return c;
}

const bucket = () => env().S3_BUCKET;
const serverClient = () => client(env().S3_ENDPOINT);
const publicClient = () => client(env().S3_PUBLIC_ENDPOINT ?? env().S3_ENDPOINT);

/** How long a presigned upload URL stays valid: long enough for one photo on a slow yard network. */
export const UPLOAD_URL_SECONDS = 120;

/**
 * A URL the browser PUTs the photo to, valid for `seconds`. Content-Type and Content-Length are
 * signed: a PUT with another type or another length fails the signature (the browser sets
 * Content-Length from the body itself). Only pending keys are ever presigned (see photos/uploads).
 */
export function presignPhotoUpload(
  objectKey: string,
  contentType: string,
  byteSize: number,
  seconds = UPLOAD_URL_SECONDS,
): Promise<string> {
  return getSignedUrl(
    publicClient(),
    new PutObjectCommand({
      Bucket: bucket(),
      Key: objectKey,
      ContentType: contentType,
      ContentLength: byteSize,
    }),
    { expiresIn: seconds, signableHeaders: new Set(['content-type', 'content-length']) },
  );
}

/** The object's bytes, or null when it is not there; stops reading past `maxBytes` (returns what it read, longer than max). */
export async function readObject(objectKey: string, maxBytes: number): Promise<Uint8Array | null> {
  try {
    const out = await serverClient().send(new GetObjectCommand({ Bucket: bucket(), Key: objectKey }));
    if (!out.Body) return null;
    const reader = out.Body.transformToWebStream().getReader();
    const chunks: Uint8Array[] = [];
    let total = 0;
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      chunks.push(value);
      total += value.length;
      if (total > maxBytes) {
        await reader.cancel();
        break;
      }
    }
    const bytes = new Uint8Array(total);
    let at = 0;
    for (const c of chunks) {
      bytes.set(c, at);
      at += c.length;
    }
    return bytes;
  } catch (error) {
    if (
      (error as { name?: string }).name === 'NoSuchKey' ||
      (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404
    )
      return null;
    throw error;
  }
}

/** A readable stream of the object, for serving a photo through the app. */
export async function streamObject(objectKey: string): Promise<ReadableStream | null> {
  try {
    const out = await serverClient().send(new GetObjectCommand({ Bucket: bucket(), Key: objectKey }));
    return out.Body ? out.Body.transformToWebStream() : null;
  } catch (error) {
    if ((error as { name?: string }).name === 'NoSuchKey') return null;
    throw error;
  }
}

export async function deleteObject(objectKey: string): Promise<void> {
  await serverClient().send(new DeleteObjectCommand({ Bucket: bucket(), Key: objectKey }));
}

/** Server-side upload (tests and the seed's demo photos). */
export async function putObject(objectKey: string, body: Uint8Array, contentType: string): Promise<void> {
  await serverClient().send(
    new PutObjectCommand({ Bucket: bucket(), Key: objectKey, Body: body, ContentType: contentType }),
  );
}

/** Keys under `prefix` with when each was last written (every page of the listing). */
export async function listObjects(prefix: string): Promise<{ key: string; lastModified: Date }[]> {
  const out: { key: string; lastModified: Date }[] = [];
  let token: string | undefined;
  do {
    const page = await serverClient().send(
      new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token }),
    );
    for (const o of page.Contents ?? [])
      if (o.Key) out.push({ key: o.Key, lastModified: o.LastModified ?? new Date(0) });
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return out;
}
