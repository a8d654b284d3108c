import type { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import { isSafeKey, UPLOADS_PUBLIC_PATH, type Storage, type StoredObject } from './storage';

export interface S3StorageOptions {
  bucket: string;
  region: string;
  /** Any S3-compatible endpoint (the local stand-in, a self-hosted object store); unset means AWS itself. */
  endpoint?: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  /** Path-style addressing (`endpoint/bucket/key`), which most self-hosted stores and the stand-in need. */
  forcePathStyle?: boolean;
}

/**
 * Object storage through the official AWS SDK. Files keep the same `/uploads/<key>` URLs as on local disk: the API
 * streams them from the bucket (`read`), so the bucket stays private and the CSP keeps `img-src 'self'`.
 */
export function s3Storage(o: S3StorageOptions): Storage & { client: S3Client; bucket: string } {
  const client = new S3Client({
    region: o.region,
    endpoint: o.endpoint,
    forcePathStyle: o.forcePathStyle ?? Boolean(o.endpoint),
    credentials:
      o.accessKeyId && o.secretAccessKey
        ? { accessKeyId: o.accessKeyId, secretAccessKey: o.secretAccessKey }
        : undefined,
  });
  const check = (key: string) => {
    if (!isSafeKey(key)) throw new Error(`Refusing unsafe storage key: ${key}`);
    return key;
  };
  return {
    client,
    bucket: o.bucket,
    async put(key, buffer, contentType) {
      await client.send(
        new PutObjectCommand({
          Bucket: o.bucket,
          Key: check(key),
          Body: buffer,
          ContentType: contentType,
          CacheControl: 'public, max-age=31536000, immutable',
        }),
      );
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket: o.bucket, Key: check(key) }));
    },
    url: (key) => `${UPLOADS_PUBLIC_PATH}/${key}`,
    async read(key): Promise<StoredObject | null> {
      if (!isSafeKey(key)) return null;
      try {
        const out = await client.send(new GetObjectCommand({ Bucket: o.bucket, Key: key }));
        if (!out.Body) return null;
        return {
          body: out.Body as Readable,
          contentType: out.ContentType ?? 'application/octet-stream',
          length: out.ContentLength,
        };
      } catch (err) {
        if (err instanceof NoSuchKey || (err as { name?: string }).name === 'NotFound') return null;
        throw err;
      }
    },
  };
}
