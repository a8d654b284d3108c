import { Op, QueryTypes, type Transaction } from 'sequelize';
import { AppError } from '../../errors/app-error';
import { withParentLocked } from '../../lib/serialize';
import { UploadedImage, User } from '../../models';
import { processImage } from './image';
import { getStorage, isSafeKey, newKey, thumbKey, UPLOADS_PUBLIC_PATH } from './storage';

/** One stored image and its thumbnail, with their keys and public addresses. */
export interface StoredImage {
  key: string;
  thumbKey: string;
  url: string;
  thumbUrl: string;
  width: number;
  height: number;
}

/**
 * Per-member limits on uploaded images. `quotaBytes` covers everything a member keeps in storage: images in
 * posts and the photos of their listings. `maxUnused` caps images uploaded for a post that is not saved yet,
 * so an editor left open cannot fill the disk; `graceMs` is how long an unused image is kept before the sweep
 * removes it.
 */
export interface ImageQuota {
  quotaBytes: number;
  maxUnused: number;
  graceMs: number;
}

export const DEFAULT_IMAGE_QUOTA: ImageQuota = {
  quotaBytes: 200 * 1_000_000,
  maxUnused: 40,
  graceMs: 24 * 3_600_000,
};

let quota: ImageQuota = DEFAULT_IMAGE_QUOTA;

/** Sets the limits (from env at start; tests set small ones). */
export function configureImageQuota(next: Partial<ImageQuota>) {
  quota = { ...DEFAULT_IMAGE_QUOTA, ...next };
}

const mb = (bytes: number) => `${(bytes / 1_000_000).toFixed(1)} MB`;

/** What a member keeps in storage now: post images, listing photos, and how many post images are unused. */
export async function imageUsage(userId: number, transaction?: Transaction) {
  const sequelize = UploadedImage.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  const [row] = await sequelize.query<{ posts: string | null; unused: string | null }>(
    'SELECT SUM(bytes) AS posts, SUM(claimed_at IS NULL) AS unused FROM uploaded_images WHERE user_id = :userId',
    { replacements: { userId }, type: QueryTypes.SELECT, transaction },
  );
  const [photos] = await sequelize.query<{ listings: string | null }>(
    `SELECT SUM(p.bytes) AS listings FROM listing_photos p JOIN listings l ON l.id = p.listing_id
     WHERE l.seller_id = :userId`,
    { replacements: { userId }, type: QueryTypes.SELECT, transaction },
  );
  const postBytes = Number(row?.posts ?? 0);
  const listingBytes = Number(photos?.listings ?? 0);
  return {
    usedBytes: postBytes + listingBytes,
    postBytes,
    listingBytes,
    unused: Number(row?.unused ?? 0),
    quotaBytes: quota.quotaBytes,
    maxUnused: quota.maxUnused,
  };
}

/**
 * Refuses (409 on `field`) an upload of `bytes` that would take the member past the quota, or past the unused
 * limit when `forPost`. Call it inside a transaction that holds the member's row lock, so two uploads at once
 * cannot both pass.
 */
export async function assertImageRoom(
  userId: number,
  bytes: number,
  opts: { field: string; forPost: boolean; count?: number },
  transaction: Transaction,
) {
  const u = await imageUsage(userId, transaction);
  if (opts.forPost && u.unused + (opts.count ?? 1) > u.maxUnused)
    throw new AppError(
      'CONFLICT',
      `You have ${u.unused} images uploaded that are not in a saved post yet (the limit is ${u.maxUnused}). Save the post you are writing, or remove images you do not need; unused images are deleted after ${Math.round(quota.graceMs / 3_600_000)} hours.`,
      { [opts.field]: `${u.unused} unsaved images already; save your post first` },
    );
  if (u.usedBytes + bytes > u.quotaBytes)
    throw new AppError(
      'CONFLICT',
      `Your images take ${mb(u.usedBytes)} of the ${mb(u.quotaBytes)} each member may keep, and this one needs ${mb(bytes)} more. Remove photos from old listings or images from old posts to make room.`,
      { [opts.field]: `Image storage full (${mb(u.usedBytes)} of ${mb(u.quotaBytes)})` },
    );
}

/**
 * Verifies, re-encodes and stores an image for a post under the member's quota and records it as unused until a
 * saved post shows it. Files written for a request that then fails are removed.
 */
export async function storePostImage(userId: number, buffer: Buffer): Promise<StoredImage> {
  const img = await processImage(buffer);
  const storage = getStorage();
  const key = newKey('images');
  const tKey = thumbKey(key);
  const bytes = img.full.length + img.thumb.length;
  try {
    await withParentLocked(User, userId, async (transaction) => {
      await assertImageRoom(userId, bytes, { field: 'image', forPost: true }, transaction);
      // The same keys on a retried transaction, so a retry overwrites rather than leaves files behind.
      await storage.put(key, img.full, img.mime);
      await storage.put(tKey, img.thumb, img.mime);
      await UploadedImage.create(
        { userId, storageKey: key, thumbKey: tKey, bytes, claimedAt: null, releasedAt: null },
        { transaction },
      );
    });
  } catch (err) {
    await Promise.all([key, tKey].map((k) => storage.delete(k).catch(() => undefined)));
    throw err;
  }
  return {
    key,
    thumbKey: tKey,
    url: storage.url(key),
    thumbUrl: storage.url(tKey),
    width: img.width,
    height: img.height,
  };
}

const SRC = /<img\s[^>]*?src="([^"]*)"/g;

/** Storage keys of the uploaded images an HTML body shows (`/uploads/<key>`). */
export function imageKeysIn(html: string | null | undefined): string[] {
  const prefix = `${UPLOADS_PUBLIC_PATH}/`;
  const keys = new Set<string>();
  for (const m of (html ?? '').matchAll(SRC)) {
    const src = m[1] ?? '';
    if (!src.startsWith(prefix)) continue;
    const key = src.slice(prefix.length);
    if (isSafeKey(key)) keys.add(key);
  }
  return [...keys];
}

/**
 * Records what a saved post shows: images in `after` are in use; images in `before` but no longer in `after`
 * start their grace period (the sweep checks every post before it removes one, so an image another post still
 * shows is kept).
 */
export async function trackPostImages(
  before: string | null | undefined,
  after: string | null | undefined,
  transaction?: Transaction,
) {
  const now = imageKeysIn(after);
  const gone = imageKeysIn(before).filter((k) => !now.includes(k));
  if (now.length)
    await UploadedImage.update(
      { claimedAt: new Date(), releasedAt: null },
      { where: { storageKey: { [Op.in]: now } }, transaction },
    );
  if (gone.length)
    await UploadedImage.update(
      { claimedAt: null, releasedAt: new Date() },
      { where: { storageKey: { [Op.in]: gone } }, transaction },
    );
}

/** True when some post's published body or pending revision still shows `key`. */
async function stillShown(key: string) {
  const sequelize = UploadedImage.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  // Keys hold only [a-z0-9-/.], so they need no LIKE escaping.
  const rows = await sequelize.query(
    'SELECT id FROM posts WHERE body_html LIKE :pat OR revision LIKE :pat LIMIT 1',
    { replacements: { pat: `%${UPLOADS_PUBLIC_PATH}/${key}%` }, type: QueryTypes.SELECT },
  );
  return rows.length > 0;
}

/**
 * Removes post images that have been unused for longer than the grace period by `at` (files and rows). An image
 * some post still shows (pasted into another post, say) is marked in use instead. Safe to run from several
 * processes: a row is removed only by the delete that found it.
 */
export async function sweepUnusedImages(at = new Date(), batch = 500) {
  const cutoff = new Date(at.getTime() - quota.graceMs);
  const due = await UploadedImage.findAll({
    where: {
      claimedAt: null,
      [Op.or]: [
        { releasedAt: { [Op.lt]: cutoff } },
        { releasedAt: null, createdAt: { [Op.lt]: cutoff } },
      ],
    },
    order: [['id', 'ASC']],
    limit: batch,
  });
  const storage = getStorage();
  let removed = 0;
  let kept = 0;
  for (const img of due) {
    if (await stillShown(img.storageKey)) {
      await img.update({ claimedAt: at, releasedAt: null });
      kept += 1;
      continue;
    }
    const count = await UploadedImage.destroy({ where: { id: img.id, claimedAt: null } });
    if (count === 0) continue;
    await storage.delete(img.storageKey).catch(() => undefined);
    await storage.delete(img.thumbKey).catch(() => undefined);
    removed += 1;
  }
  return { removed, kept };
}
