import { MAX_LISTING_PHOTOS } from '@app/shared';
import { AppError, invalid } from '../../errors/app-error';
import { Listing, ListingPhoto, User } from '../../models';
import { assertImageRoom } from '../uploads/image-quota';
import { processImage, type ProcessedImage } from '../uploads/image';
import { getStorage, newKey, thumbKey } from '../uploads/storage';
import { listingChanged } from './listing-index';
import { getOwnListing } from './listing-reads.service';

const FIELD = 'photos';

/**
 * Adds photos to the seller's own listing (at most 8 in all). Every file is verified and re-encoded before anything
 * is stored; if any step fails, files already written in this call are removed and no rows remain.
 */
export async function addPhotos(actor: User, listingId: number, buffers: Buffer[]) {
  const listing = await getOwnListing(actor, listingId);
  if (listing.status === 'sold') throw new AppError('CONFLICT', 'A sold listing cannot change');
  if (buffers.length === 0) throw invalid({ [FIELD]: 'Attach at least one photo' });
  const existing = await ListingPhoto.count({ where: { listingId } });
  if (existing + buffers.length > MAX_LISTING_PHOTOS)
    throw invalid({
      [FIELD]: `A listing can have at most ${MAX_LISTING_PHOTOS} photos (it has ${existing})`,
    });
  const processed: ProcessedImage[] = [];
  for (const [i, b] of buffers.entries()) {
    try {
      processed.push(await processImage(b, { field: FIELD }));
    } catch (err) {
      if (err instanceof AppError && err.fields && buffers.length > 1)
        throw new AppError(err.code, `Photo ${i + 1}: ${err.message}`, {
          [FIELD]: `Photo ${i + 1}: ${err.fields[FIELD] ?? err.message}`,
        });
      throw err;
    }
  }
  const storage = getStorage();
  const written: string[] = [];
  const sequelize = ListingPhoto.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  try {
    // Files first, outside the transaction: a managed transaction runs again after a deadlock or a certification
    // conflict, and that must not write the files twice. A failure below removes them again.
    const stored: { img: ProcessedImage; key: string; tKey: string }[] = [];
    for (const img of processed) {
      const key = newKey('listings');
      const tKey = thumbKey(key);
      await storage.put(key, img.full, img.mime);
      written.push(key);
      await storage.put(tKey, img.thumb, img.mime);
      written.push(tKey);
      stored.push({ img, key, tKey });
    }
    const rows = await sequelize.transaction(async (transaction) => {
      // The member's row first (the order every image upload takes), so the image quota holds too; then
      // counted again under the listing's row lock: concurrent uploads queue here, so the limit holds and
      // positions never repeat.
      await User.findByPk(actor.id, {
        transaction,
        lock: transaction.LOCK.UPDATE,
        attributes: ['id'],
      });
      await Listing.findByPk(listingId, { transaction, lock: transaction.LOCK.UPDATE });
      const now = await ListingPhoto.findAll({
        where: { listingId },
        attributes: ['position'],
        transaction,
      });
      if (now.length + stored.length > MAX_LISTING_PHOTOS)
        throw invalid({
          [FIELD]: `A listing can have at most ${MAX_LISTING_PHOTOS} photos (it has ${now.length})`,
        });
      const bytes = processed.reduce((sum, img) => sum + img.full.length + img.thumb.length, 0);
      await assertImageRoom(
        actor.id,
        bytes,
        { field: FIELD, forPost: false, count: processed.length },
        transaction,
      );
      const next = now.reduce((max, p) => Math.max(max, p.position + 1), 0);
      const out: ListingPhoto[] = [];
      for (const [i, { img, key, tKey }] of stored.entries()) {
        out.push(
          await ListingPhoto.create(
            {
              listingId,
              storageKey: key,
              thumbKey: tKey,
              width: img.width,
              height: img.height,
              position: next + i,
              bytes: img.full.length + img.thumb.length,
            },
            { transaction },
          ),
        );
      }
      return out;
    });
    await listingChanged(listingId);
    return rows;
  } catch (err) {
    await Promise.all(written.map((k) => storage.delete(k).catch(() => undefined)));
    throw err;
  }
}

/** Removes one photo (row and files) from the seller's own listing; the rest keep their order. */
export async function deletePhoto(actor: User, listingId: number, photoId: number) {
  await getOwnListing(actor, listingId);
  const photo = await ListingPhoto.findOne({ where: { id: photoId, listingId } });
  if (!photo) throw new AppError('NOT_FOUND', 'Photo not found');
  await photo.destroy();
  const storage = getStorage();
  await storage.delete(photo.storageKey);
  await storage.delete(photo.thumbKey);
  await listingChanged(listingId);
}

/** Sets the photo order; `photoIds` must list every photo of the listing exactly once. */
export async function reorderPhotos(actor: User, listingId: number, photoIds: number[]) {
  await getOwnListing(actor, listingId);
  const photos = await ListingPhoto.findAll({ where: { listingId } });
  const have = photos.map((p) => p.id).sort((a, b) => a - b);
  const want = [...photoIds].sort((a, b) => a - b);
  if (have.length !== want.length || have.some((id, i) => id !== want[i]))
    throw invalid({ photoIds: 'List every photo of this listing exactly once' });
  for (const p of photos) await p.update({ position: photoIds.indexOf(p.id) });
  await listingChanged(listingId);
}
