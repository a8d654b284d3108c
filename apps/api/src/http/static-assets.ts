import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express, type Request, type Response } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { DEFAULT_CLUB_LOCALE } from '@app/shared';
import type { Env } from '../config/env';
import { cachedClub } from '../modules/club/club-cache';
import { uploadsFromStorage, uploadsStatic } from '../modules/uploads/uploads.router';

/** Uploaded images under /uploads: from object storage, or from the upload directory on disk. */
export function serveUploads(app: Express, env: Env, uploadDir: string) {
  if (env.STORAGE === 's3') app.use('/uploads', uploadsFromStorage());
  else app.use('/uploads', ...uploadsStatic(uploadDir));
}

/** The built web client from WEB_DIST, when there is one: hashed assets, other files, and index.html for pages. */
export function serveWebApp(app: Express, env: Env) {
  const webDist = env.WEB_DIST;
  if (!webDist || !existsSync(join(webDist, 'index.html'))) return;
  // Hashed assets: brotli or gzip files written at build time (vite.config.ts), cached for a year.
  app.use(
    '/assets',
    expressStaticGzip(join(webDist, 'assets'), {
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      index: false,
      serveStatic: { immutable: true, maxAge: '365d', index: false },
    }),
    (_req: Request, res: Response) => {
      res.status(404).type('text/plain').send('Not found');
    },
  );
  app.use(express.static(webDist, { index: false, maxAge: '1h' }));
  // Every page is index.html with the club's locale in a meta tag, so the first render formats dates and
  // money the club's way (the values are a listed region, an ISO currency code and a unit system).
  const indexHtml = readFileSync(join(webDist, 'index.html'), 'utf8');
  app.get('/{*splat}', async (_req, res) => {
    const club = await cachedClub().catch(() => null);
    const l = club?.locale ?? DEFAULT_CLUB_LOCALE;
    const meta = `<meta name="rw-locale" content="${l.region}|${l.currency}|${l.unitSystem}">`;
    res
      .set('Cache-Control', 'no-cache')
      .type('html')
      .send(indexHtml.replace('</head>', `${meta}</head>`));
  });
}
