import express, { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from '../../errors/app-error';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { MAX_IMAGE_BYTES } from './image';
import { getStorage, isSafeKey } from './storage';
import { imageUsage, storePostImage } from './image-quota';

/**
 * A multipart body the parser cannot read (no boundary, a broken part header, a body cut off before its closing
 * boundary) is the client's fault: 400 naming the upload field, never a 500.
 */
const readable =
  (parse: RequestHandler, field: string): RequestHandler =>
  (req, res, next) => {
    parse(req, res, (err?: unknown) => {
      if (!err || err instanceof multer.MulterError || err instanceof AppError) {
        next(err);
        return;
      }
      const message =
        'The upload arrived incomplete or malformed. Choose the file again and resend it.';
      next(new AppError('VALIDATION_FAILED', message, { [field]: message }));
    });
  };

/** multer in memory with the image limits; the bytes are verified by content afterwards. */
export const imageUpload = (maxFiles: number) => {
  const m = multer({
    storage: multer.memoryStorage(),
    // One file over the limit is let through to multer so it reports LIMIT_UNEXPECTED_FILE with the field name.
    limits: { fileSize: MAX_IMAGE_BYTES, files: maxFiles + 1, fields: 40, parts: maxFiles + 41 },
  });
  return {
    single: (field: string) => readable(m.single(field), field),
    array: (field: string, max: number) => readable(m.array(field, max), field),
  };
};

/**
 * `POST /api/uploads/images` (signed in, multipart field `image`) → `{ data: { url, thumbUrl, width, height } }`,
 * under the member's image quota (409 naming `image` when full). `GET /api/uploads/usage` → what the member keeps.
 */
export function uploadsRouter() {
  const r = Router();
  r.post('/images', requireAuth(), imageUpload(1).single('image'), async (req, res) => {
    const user = currentUser(req);
    if (!req.file)
      throw new AppError('VALIDATION_FAILED', 'Attach an image in the field "image"', {
        image: 'Attach an image',
      });
    const img = await storePostImage(user.id, req.file.buffer);
    res.status(201).json({
      data: { url: img.url, thumbUrl: img.thumbUrl, width: img.width, height: img.height },
    });
  });
  r.get('/usage', requireAuth(), async (req, res) => {
    res.json({ data: await imageUsage(currentUser(req).id) });
  });
  return r;
}

/** Serves stored files with long cache headers (keys are unique, so a file never changes); unknown keys get 404. */
export function uploadsStatic(dir: string): RequestHandler[] {
  const serve = express.static(dir, {
    immutable: true,
    maxAge: '365d',
    index: false,
    dotfiles: 'deny',
    redirect: false,
  });
  const notFound: RequestHandler = (_req, res) => {
    res.status(404).type('text/plain').send('Not found');
  };
  const nosniff: RequestHandler = (_req, res, next) => {
    res.set('X-Content-Type-Options', 'nosniff');
    next();
  };
  return [nosniff, serve, notFound];
}

/**
 * Serves stored files from whatever storage is configured (object storage in a cluster), with the same headers as
 * `uploadsStatic`; unknown or unsafe keys get 404.
 */
export function uploadsFromStorage(): RequestHandler {
  return (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    const key = decodeURIComponent(req.path.replace(/^\//, ''));
    res.set('X-Content-Type-Options', 'nosniff');
    if (!isSafeKey(key)) {
      res.status(404).type('text/plain').send('Not found');
      return;
    }
    getStorage()
      .read(key)
      .then((obj) => {
        if (!obj) {
          res.status(404).type('text/plain').send('Not found');
          return;
        }
        res.set('Cache-Control', 'public, max-age=31536000, immutable');
        res.type(obj.contentType);
        if (obj.length !== undefined) res.set('Content-Length', String(obj.length));
        if (req.method === 'HEAD') {
          obj.body.destroy();
          res.end();
          return;
        }
        obj.body.on('error', next);
        obj.body.pipe(res);
      }, next);
  };
}
