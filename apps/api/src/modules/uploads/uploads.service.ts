import { processImage } from './image';
import { getStorage, newKey, thumbKey } from './storage';

export interface StoredImage {
  key: string;
  thumbKey: string;
  url: string;
  thumbUrl: string;
  width: number;
  height: number;
}

/**
 * Verifies, re-encodes and stores one image with its thumbnail under fresh keys.
 * If the second write fails, the first file is removed so nothing is left behind. Throws what processImage throws.
 */
export async function storeImage(
  buffer: Buffer,
  opts: { prefix?: 'images' | 'listings'; field?: string } = {},
): Promise<StoredImage> {
  const img = await processImage(buffer, { field: opts.field });
  const storage = getStorage();
  const key = newKey(opts.prefix ?? 'images');
  const tKey = thumbKey(key);
  await storage.put(key, img.full, img.mime);
  try {
    await storage.put(tKey, img.thumb, img.mime);
  } catch (err) {
    await storage.delete(key);
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

/** Removes a stored image and its thumbnail; missing files are ignored. */
export async function deleteStoredImage(key: string) {
  const storage = getStorage();
  await storage.delete(key);
  await storage.delete(thumbKey(key));
}
