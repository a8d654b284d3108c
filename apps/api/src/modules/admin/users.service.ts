import { Op, type Sequelize } from 'sequelize';
import type { Role } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { User, UserRole } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { dropsOwnAdminRole } from '../../policies/admin';

/** Users matching `q` (name or e-mail), with roles, for the admin page. */
export function listUsers(q?: string) {
  const where = q
    ? { [Op.or]: [{ email: { [Op.like]: `%${q}%` } }, { displayName: { [Op.like]: `%${q}%` } }] }
    : {};
  return User.findAll({
    where,
    include: [{ model: UserRole, as: 'roles' }],
    order: [['displayName', 'ASC']],
    limit: 500,
  });
}

/**
 * Replaces a user's roles. An admin cannot drop their own admin role (409), so a club is never left without one
 * by accident. Logged to the audit trail; the user is told by e-mail.
 */
export async function setRoles(sequelize: Sequelize, actor: User, userId: number, roles: Role[]) {
  if (dropsOwnAdminRole(actor, userId, roles)) {
    throw new AppError('CONFLICT', 'You cannot remove your own admin role. Ask another admin.', {
      roles: 'Keep admin for yourself',
    });
  }
  await sequelize.transaction(async (t) => {
    const user = await User.findByPk(userId, {
      include: [{ model: UserRole, as: 'roles' }],
      transaction: t,
      lock: t.LOCK.UPDATE,
    });
    if (!user) throw notFound('User');
    const before = user.roleNames;
    const added = roles.filter((r) => !before.includes(r));
    const removed = before.filter((r) => !roles.includes(r));
    if (!added.length && !removed.length) return;
    if (removed.length)
      await UserRole.destroy({ where: { userId, role: removed }, transaction: t });
    for (const role of added)
      await UserRole.create({ userId, role, grantedById: actor.id }, { transaction: t });
    await recordAudit(
      {
        actorId: actor.id,
        area: 'admin',
        action: 'roles.set',
        subjectType: 'user',
        subjectId: String(userId),
        details: { before, after: [...roles].sort(), added, removed },
      },
      t,
    );
    await enqueueEmail(
      actionEmail({
        to: user.email,
        kind: 'roles-changed',
        subject: 'Your Rodewise roles changed',
        greeting: `Hello ${user.displayName},`,
        lines: [
          ...(added.length ? [`You now also hold: ${added.join(', ')}.`] : []),
          ...(removed.length ? [`You no longer hold: ${removed.join(', ')}.`] : []),
          `The change was made by ${actor.displayName}.`,
        ],
      }),
      t,
    );
  });
  const fresh = await User.findByPk(userId, { include: [{ model: UserRole, as: 'roles' }] });
  if (!fresh) throw notFound('User');
  return fresh;
}
