import type { Transaction } from 'sequelize';
import { notFound } from '../../errors/app-error';
import { Notification, type User } from '../../models';

/** Stores an in-app notice for one member (inside the caller's transaction when given). */
export async function notify(
  userId: number,
  kind: string,
  message: string,
  link: string | null,
  transaction?: Transaction,
) {
  return Notification.create(
    { userId, kind, message: message.slice(0, 300), link, readAt: null },
    { transaction },
  );
}

/** How many notices the member has not read (the navigation badge). */
export const countUnread = (user: User) =>
  Notification.count({ where: { userId: user.id, readAt: null } });

/** The member's latest 30 notices and how many are unread. */
export async function listNotifications(user: User) {
  const [rows, unread] = await Promise.all([
    Notification.findAll({ where: { userId: user.id }, order: [['id', 'DESC']], limit: 30 }),
    countUnread(user),
  ]);
  return { rows, unread };
}

/** Marks every notice of the member read. */
export async function markAllRead(user: User) {
  await Notification.update({ readAt: new Date() }, { where: { userId: user.id, readAt: null } });
}

/** Marks one notice of the member read; anyone else's notice is not found. */
export async function markOneRead(user: User, id: number) {
  const notice = await Notification.findOne({ where: { id, userId: user.id } });
  if (!notice) throw notFound('Notice');
  if (!notice.readAt) await notice.update({ readAt: new Date() });
  return notice;
}
