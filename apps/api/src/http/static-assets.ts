import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express, type Request, type Response } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { DEFAULT_CLUB_LOCALE, type ClubDto } from '@app/shared';
import type { Env } from '../config/env';
import { cachedClub } from '../modules/club/club-cache';
import { uploadsFromStorage, uploadsStatic } from '../modules/uploads/uploads.router';
import { hasCookie, SESSION_COOKIE } from './visitor-session';

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
  // money the club's way (the values are a listed region, an ISO currency code and a unit system), and with the
  // boot data (bootData below). The page differs with the session cookie, so it says so to caches.
  const indexHtml = readFileSync(join(webDist, 'index.html'), 'utf8');
  const preloads = routePreloads(webDist);
  app.get('/{*splat}', async (req, res) => {
    const club = await cachedClub().catch(() => null);
    const l = club?.locale ?? DEFAULT_CLUB_LOCALE;
    const meta = `<meta name="rw-locale" content="${l.region}|${l.currency}|${l.unitSystem}">`;
    const boot = bootData(club, !hasCookie(req.headers.cookie, SESSION_COOKIE));
    res
      .set('Cache-Control', 'no-cache')
      .vary('Cookie')
      .type('html')
      .send(indexHtml.replace('</head>', `${boot}${meta}${preloads(req.path)}</head>`));
  });
}

/**
 * What the first render can know without asking the API: the club as GET /api/club answers it, and whether the
 * request came without a session cookie (then nobody is signed in, and the visitor's screen can render at once
 * while GET /api/auth/me fetches the CSRF token behind it). A JSON data block, which the browser never runs (the
 * script policy is not loosened); `<` is escaped so a club name cannot close the element.
 */
export function bootData(club: ClubDto | null, visitor: boolean): string {
  const json = JSON.stringify({ club, visitor }).replace(/</g, '\\u003c');
  return `<script type="application/json" id="rw-boot">${json}</script>`;
}

/**
 * The modulepreload links for a page's own script files (route-chunks.json, written by the build: a screen's lazy
 * chunk and its imports), so they download beside the entry instead of after it has run. Unknown paths get none.
 */
export function routePreloads(webDist: string): (path: string) => string {
  const file = join(webDist, 'route-chunks.json');
  if (!existsSync(file)) return () => '';
  const routes = (
    JSON.parse(readFileSync(file, 'utf8')) as Array<{ pattern: string; files: string[] }>
  )
    .filter((r) => r.files.every((f) => /^\/assets\/[\w.-]+\.js$/.test(f)))
    .map((r) => ({
      test: new RegExp(`^${r.pattern.replace(/:\w+/g, '[^/]+').replace(/\/$/, '')}/?$`),
      links: r.files.map((f) => `<link rel="modulepreload" crossorigin href="${f}">`).join(''),
    }));
  return (path) => routes.find((r) => r.test.test(path))?.links ?? '';
}
