import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, rm, stat, writeFile } from 'node:fs/promises';
import type { Readable } from 'node:stream';
import { dirname, join, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';

/** A stored file as read back: its bytes as a stream and what to answer with. */
export interface StoredObject {
  body: Readable;
  contentType: string;
  length?: number;
}

/** Where uploaded files live: local disk by default (`localDiskStorage`), S3-compatible storage in a cluster (`s3Storage`). */
export interface Storage {
  put(key: string, buffer: Buffer, contentType: string): Promise<void>;
  delete(key: string): Promise<void>;
  url(key: string): string;
  /** The file under `key`, or null when there is none. */
  read(key: string): Promise<StoredObject | null>;
}

const TYPES: Record<string, string> = { webp: 'image/webp', jpg: 'image/jpeg', png: 'image/png' };

/** `.data/uploads` at the repository root. */
export const DEFAULT_UPLOAD_DIR = fileURLToPath(
  new URL('../../../../../.data/uploads', import.meta.url),
);
/** Public path the API serves stored files under. */
export const UPLOADS_PUBLIC_PATH = '/uploads';

const KEY_RE = /^[a-z0-9-]+(\/[a-z0-9-]+)*\.(webp|jpg|png)$/;

/** True for keys this module generates; anything else (.., absolute paths, odd characters) is refused. */
export const isSafeKey = (key: string) => KEY_RE.test(key) && !key.includes('..');

/** A fresh key such as `images/2026/12/<uuid>.webp`; never derived from the client's file name. */
export function newKey(
  prefix: 'images' | 'listings',
  ext: 'webp' = 'webp',
  at = new Date(),
): string {
  const month = String(at.getUTCMonth() + 1).padStart(2, '0');
  return `${prefix}/${at.getUTCFullYear()}/${month}/${randomUUID()}.${ext}`;
}

/** The thumbnail key that belongs to `key`. */
export const thumbKey = (key: string) => key.replace(/\.(\w+)$/, '-thumb.$1');

/** Local-disk storage under `dir`, served by the API at `/uploads/<key>`. */
export function localDiskStorage(dir: string): Storage & { dir: string } {
  const root = resolve(dir);
  const pathOf = (key: string) => {
    if (!isSafeKey(key)) throw new Error(`Refusing unsafe storage key: ${key}`);
    const p = resolve(join(root, key));
    if (!p.startsWith(root + sep)) throw new Error(`Refusing unsafe storage key: ${key}`);
    return p;
  };
  return {
    dir: root,
    async put(key, buffer) {
      const p = pathOf(key);
      await mkdir(dirname(p), { recursive: true });
      await writeFile(p, buffer, { flag: 'wx' });
    },
    async delete(key) {
      await rm(pathOf(key), { force: true });
    },
    url: (key) => `${UPLOADS_PUBLIC_PATH}/${key}`,
    async read(key) {
      if (!isSafeKey(key)) return null;
      const p = pathOf(key);
      const s = await stat(p).catch(() => null);
      if (!s?.isFile()) return null;
      const ext = key.slice(key.lastIndexOf('.') + 1);
      return {
        body: createReadStream(p),
        contentType: TYPES[ext] ?? 'application/octet-stream',
        length: s.size,
      };
    },
  };
}

let current: (Storage & { dir?: string }) | null = null;

/** Sets the process-wide storage (createApp does this from UPLOAD_DIR). */
export function configureStorage(storage: Storage & { dir?: string }) {
  current = storage;
}

/** The process-wide storage; local disk under `.data/uploads` when nothing was configured. */
export function getStorage(): Storage & { dir?: string } {
  current ??= localDiskStorage(DEFAULT_UPLOAD_DIR);
  return current;
}

/** The storage key for a URL this storage produced, or null for anything else. */
export function keyFromUrl(url: string): string | null {
  if (!url.startsWith(`${UPLOADS_PUBLIC_PATH}/`)) return null;
  const key = url.slice(UPLOADS_PUBLIC_PATH.length + 1);
  return isSafeKey(key) ? key : null;
}
