import { Router } from 'express';
import { changePasswordSchema, updateAccountSchema } from '@app/shared';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { changePassword, type AuthDeps } from '../auth/auth.service';
import { toUserDto } from '../auth/user.presenter';

export function accountRouter(deps: AuthDeps) {
  const r = Router();
  r.use(requireAuth());
  r.patch('/', async (req, res) => {
    const input = updateAccountSchema.parse(req.body);
    const user = currentUser(req);
    await user.update(input);
    res.json({ data: { user: toUserDto(user) } });
  });
  r.post('/password', async (req, res) => {
    const input = changePasswordSchema.parse(req.body);
    await changePassword(deps, currentUser(req), input.currentPassword, input.newPassword);
    res.json({ data: { ok: true } });
  });
  return r;
}
