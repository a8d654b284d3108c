import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, Response } from 'express';

/**
 * CSRF tokens for signed-out visitors without a session row: a signed double-submit cookie. The cookie holds a
 * random nonce (httpOnly, SameSite=Lax); the token is `v.` + HMAC(secret, nonce). Another site can neither read the
 * cookie nor the token, so a forged form cannot send a matching pair. Signed-in members keep the synchroniser token
 * stored in their session; this only spares a session row for every cookieless visit to `GET /api/auth/me`.
 */
export const VISITOR_CSRF_COOKIE = 'rw.vcsrf';

const cookieValue = (req: Request, name: string): string | undefined => {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return part.slice(eq + 1).trim();
  }
  return undefined;
};

export function visitorCsrf(secret: string, secure: boolean) {
  const sign = (nonce: string) =>
    `v.${createHmac('sha256', secret).update(`visitor-csrf:${nonce}`).digest('base64url')}`;
  const validNonce = (n: string | undefined): n is string => !!n && /^[\w-]{16,64}$/.test(n);
  return {
    /** The visitor's token, setting the nonce cookie when there is none yet. */
    issue(req: Request, res: Response): string {
      let nonce = cookieValue(req, VISITOR_CSRF_COOKIE);
      if (!validNonce(nonce)) {
        nonce = randomBytes(18).toString('base64url');
        res.cookie(VISITOR_CSRF_COOKIE, nonce, {
          httpOnly: true,
          sameSite: 'lax',
          secure,
          path: '/api',
        });
      }
      return sign(nonce);
    },
    /** Whether the request carries a visitor token that matches its nonce cookie. */
    verify(req: Request, token: string | undefined): boolean {
      const nonce = cookieValue(req, VISITOR_CSRF_COOKIE);
      if (!token?.startsWith('v.') || !validNonce(nonce)) return false;
      const want = Buffer.from(sign(nonce));
      const got = Buffer.from(token);
      return want.length === got.length && timingSafeEqual(want, got);
    },
  };
}
