import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { z } from 'zod';
import { setRolesSchema, userListQuerySchema } from '@app/shared';
import { currentUser, requireRole } from '../../middleware/require-auth';
import { toUserDto } from '../auth/user.presenter';
import { listUsers, setRoles } from './users.service';
import { ROLES_ADMIN } from '../../policies/roles';

const userParams = z.object({ userId: z.coerce.number().int().positive('Unknown user') });

export function adminRouter(sequelize: Sequelize) {
  const r = Router();
  r.use(requireRole(...ROLES_ADMIN));
  r.get('/users', async (req, res) => {
    const { q } = userListQuerySchema.parse(req.query);
    res.json({ data: (await listUsers(q)).map(toUserDto) });
  });
  r.put('/users/:userId/roles', async (req, res) => {
    const { userId } = userParams.parse(req.params);
    const { roles } = setRolesSchema.parse(req.body);
    const user = await setRoles(sequelize, currentUser(req), userId, roles);
    res.json({ data: { user: toUserDto(user) } });
  });
  return r;
}
