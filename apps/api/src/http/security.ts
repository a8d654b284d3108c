import compression from 'compression';
import type { Express } from 'express';
import helmet from 'helmet';
import type { Env } from '../config/env';

/** Proxy trust, compression and the security headers (CSP, HSTS behind HTTPS); first on every request. */
export function applySecurity(app: Express, env: Env) {
  // X-Forwarded-* are believed only from the proxies TRUST_PROXY names (none by default), so a client reaching
  // the API directly cannot pick its own address for the rate limits.
  app.set('trust proxy', env.TRUST_PROXY);
  app.disable('x-powered-by');
  // gzip for the client bundle, HTML and larger JSON answers (below 1 KB nothing is compressed).
  app.use(compression());

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'script-src': ["'self'"],
          'connect-src': ["'self'"],
          'frame-ancestors': ["'none'"],
          'form-action': ["'self'"],
          'upgrade-insecure-requests': env.COOKIE_SECURE ? [] : null,
          'report-uri': ['/api/csp-report'],
        },
      },
      strictTransportSecurity: env.COOKIE_SECURE,
    }),
  );
}
