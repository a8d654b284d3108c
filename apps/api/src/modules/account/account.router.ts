import { Router } from 'express';
import { changePasswordSchema, stopDigestSchema, updateAccountSchema } from '@app/shared';
import type { Env } from '../../config/env';
import { limiter } from '../../lib/rate-limit';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { changePassword, type AuthDeps } from '../auth/auth.service';
import { toUserDto } from '../auth/user.presenter';
import { stopDigestByToken, type DigestContext } from '../posts/notification-digest';

export function accountRouter(
  deps: AuthDeps,
  digest: DigestContext,
  env: Pick<Env, 'PASSWORD_CHANGE_RATE_LIMIT'>,
) {
  const r = Router();
  // Wrong current passwords per member: a borrowed, signed-in phone is no password-guessing machine.
  const passwordLimit = limiter({
    limit: env.PASSWORD_CHANGE_RATE_LIMIT,
    windowMs: 15 * 60_000,
    what: 'password change attempts',
    sequelize: deps.sequelize,
    name: 'password-change',
    key: (req) => `user:${currentUser(req).id}`,
    countSuccess: false,
  });
  // The stop link in a digest e-mail works without signing in: the token is signed for one member.
  r.post('/digest/stop', async (req, res) => {
    const { token } = stopDigestSchema.parse(req.body);
    await stopDigestByToken(digest, token);
    res.json({ data: { stopped: true } });
  });
  r.use(requireAuth());
  r.patch('/', async (req, res) => {
    const { notificationDigest, ...input } = updateAccountSchema.parse(req.body);
    const user = currentUser(req);
    await user.update({
      ...input,
      ...(notificationDigest === undefined ? {} : { digestOptIn: notificationDigest }),
    });
    res.json({ data: { user: toUserDto(user) } });
  });
  r.post('/password', passwordLimit, async (req, res) => {
    const input = changePasswordSchema.parse(req.body);
    await changePassword(
      deps,
      currentUser(req),
      input.currentPassword,
      input.newPassword,
      req.sessionID,
    );
    res.json({ data: { ok: true } });
  });
  return r;
}
