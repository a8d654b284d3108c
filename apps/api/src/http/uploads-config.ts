import type { Env } from '../config/env';
import { configureImageQuota } from '../modules/uploads/image-quota';
import { s3Storage } from '../modules/uploads/s3-storage';
import { configureStorage, DEFAULT_UPLOAD_DIR, localDiskStorage } from '../modules/uploads/storage';

/** Picks the image storage (object storage or local disk) and the per-member quota; returns the upload dir. */
export function configureUploads(env: Env): string {
  const uploadDir = env.UPLOAD_DIR ?? DEFAULT_UPLOAD_DIR;
  configureStorage(
    env.STORAGE === 's3'
      ? s3Storage({
          bucket: env.S3_BUCKET,
          region: env.S3_REGION,
          endpoint: env.S3_ENDPOINT,
          accessKeyId: env.S3_ACCESS_KEY_ID,
          secretAccessKey: env.S3_SECRET_ACCESS_KEY,
          forcePathStyle: env.S3_FORCE_PATH_STYLE,
        })
      : localDiskStorage(uploadDir),
  );
  configureImageQuota({
    quotaBytes: env.IMAGE_QUOTA_MB * 1_000_000,
    maxUnused: env.IMAGE_UNUSED_MAX,
    graceMs: env.IMAGE_GRACE_HOURS * 3_600_000,
  });
  return uploadDir;
}
