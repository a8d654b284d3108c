import type { z } from 'zod';
import { Op, type Sequelize } from 'sequelize';
import {
  displayLocale,
  type stormChecklistSchema,
  type stormCloseSchema,
  type stormWatchInputSchema,
} from '@app/shared';
import { AppError, invalid, notFound } from '../../errors/app-error';
import { Harbor, StormWatch, User, UserRole } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { getSetting, setSetting } from '../club/club.service';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { notify } from '../posts/notifications.service';
import { STORM_CAUTIONS } from './storm-check';
import { lessonsPost } from './storm-lessons';

type WatchInput = z.output<typeof stormWatchInputSchema>;
type CloseInput = z.output<typeof stormCloseSchema>;
type ChecklistInput = z.output<typeof stormChecklistSchema>;

const WATCH_INCLUDE = [{ model: User, as: 'openedBy', attributes: ['id', 'displayName'] }];

/** Every watch, open ones first (by arrival), then closed ones, newest first. */
export async function listWatches() {
  const rows = await StormWatch.findAll({ include: WATCH_INCLUDE, order: [['arrivesAt', 'DESC']] });
  return [...rows.filter((w) => w.status === 'open'), ...rows.filter((w) => w.status !== 'open')];
}

/** One watch; NOT_FOUND when there is none. */
export async function getWatch(watchId: number) {
  const watch = await StormWatch.findByPk(watchId, { include: WATCH_INCLUDE });
  if (!watch) throw notFound('Storm watch');
  return watch;
}

/** A watch that still takes changes; CONFLICT once it is closed. */
export async function getOpenWatch(watchId: number) {
  const watch = await getWatch(watchId);
  if (watch.status !== 'open')
    throw new AppError('CONFLICT', 'This storm watch is closed; it no longer takes changes');
  return watch;
}

/** The club's checklist template. */
export const getChecklist = () => getSetting('stormChecklist');

/** Replaces the checklist template (watches already open keep the list they opened with). Logged. */
export async function setChecklist(actor: User, input: ChecklistInput) {
  await setSetting('stormChecklist', input);
  await recordAudit({
    actorId: actor.id,
    area: 'storm',
    action: 'checklist.update',
    subjectType: 'storm_checklist',
    details: { items: input.items.map((i) => i.id) },
  });
  return getChecklist();
}

/** A moment in the club's region, in UTC so every reader's mail says the same ("4 Dec 2026, 18:00 UTC"). */
const when = (d: Date) =>
  `${new Intl.DateTimeFormat(displayLocale(), { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' }).format(d)} UTC`;

function watchMail(to: User, watch: StormWatch, harbours: string, publicUrl: string) {
  return actionEmail({
    to: to.email,
    kind: 'storm-watch',
    subject: `Storm watch: ${watch.name}`,
    greeting: `Hello ${to.displayName},`,
    lines: [
      `The club has opened a storm watch for ${watch.name}: ${watch.sustainedKn} kn sustained, gusting ${watch.gustKn} kn${watch.surgeM > 0 ? `, with a surge of ${watch.surgeM} m` : ''}.`,
      `Expected from ${when(watch.arrivesAt)} to ${when(watch.endsAt)} in ${harbours}.`,
      ...(watch.note ? [watch.note] : []),
      'Please say for each of your boats where it will ride the storm out and on which tackle plan, and work through the checklist. Rodewise checks the plan against the forecast gust.',
      STORM_CAUTIONS[0] ?? '',
    ],
    actionLabel: 'Fill in your boats',
    actionUrl: `${publicUrl}/storm/${watch.id}`,
    footer: 'You get this because you are a member of the club.',
  });
}

async function checkHarbors(ids: number[]) {
  const found = await Harbor.findAll({ where: { id: ids } });
  if (found.length !== new Set(ids).size)
    throw invalid({ harborIds: 'Choose harbours of the club' });
  return found;
}

/**
 * Opens a watch (moderator or admin): copies the checklist template, gives every member a notice and queues a
 * mail to each through the outbox, all in one transaction, and logs it.
 */
export async function openWatch(
  actor: User,
  input: WatchInput,
  deps: { sequelize: Sequelize; publicUrl: string },
) {
  const harbors = await checkHarbors(input.harborIds);
  const checklist = (await getChecklist()).items;
  const memberIds = (await UserRole.findAll({ where: { role: 'member' } })).map((r) => r.userId);
  const members = await User.findAll({ where: { id: memberIds } });
  const id = await deps.sequelize.transaction(async (t) => {
    const watch = await StormWatch.create(
      {
        name: input.name,
        sustainedKn: input.sustainedKn,
        gustKn: input.gustKn,
        surgeM: input.surgeM,
        arrivesAt: new Date(input.arrivesAt),
        endsAt: new Date(input.endsAt),
        harborIds: [...new Set(input.harborIds)],
        note: input.note,
        shareDetails: input.shareDetails,
        checklist,
        status: 'open',
        openedById: actor.id,
        closedById: null,
        closedAt: null,
        lessons: null,
        lessonsPostId: null,
      },
      { transaction: t },
    );
    const harbours = harbors.map((h) => h.name).join(', ');
    for (const m of members) {
      await notify(
        m.id,
        'storm-watch',
        `Storm watch opened: ${watch.name}, ${watch.sustainedKn} kn gusting ${watch.gustKn} kn. Say where your boats will be.`,
        `/storm/${watch.id}`,
        t,
      );
      await enqueueEmail(watchMail(m, watch, harbours, deps.publicUrl), t);
    }
    await recordAudit(
      {
        actorId: actor.id,
        area: 'storm',
        action: 'watch.open',
        subjectType: 'storm_watch',
        subjectId: String(watch.id),
        details: {
          name: watch.name,
          sustainedKn: watch.sustainedKn,
          gustKn: watch.gustKn,
          harborIds: watch.harborIds,
          notified: members.length,
        },
      },
      t,
    );
    return watch.id;
  });
  return getWatch(id);
}

/** Closes a watch with a lessons note; optionally starts a draft knowledge post from it. Logged. */
export async function closeWatch(actor: User, watchId: number, input: CloseInput) {
  const watch = await getOpenWatch(watchId);
  const post = input.makePost ? await lessonsPost(actor, watch, input.lessons) : null;
  // Conditional update: two moderators closing at once cannot both succeed.
  const [changed] = await StormWatch.update(
    {
      status: 'closed',
      closedAt: new Date(),
      closedById: actor.id,
      lessons: input.lessons,
      lessonsPostId: post?.id ?? null,
    },
    { where: { id: watch.id, status: 'open' } },
  );
  if (changed === 0) throw new AppError('CONFLICT', 'This storm watch is already closed');
  await recordAudit({
    actorId: actor.id,
    area: 'storm',
    action: 'watch.close',
    subjectType: 'storm_watch',
    subjectId: String(watch.id),
    reason: input.lessons.slice(0, 1000),
    details: { lessonsPostId: post?.id ?? null },
  });
  return getWatch(watch.id);
}

/** Members a moderator may name as a buddy, by name. */
export async function buddyCandidates() {
  const ids = (await UserRole.findAll({ where: { role: 'member' } })).map((r) => r.userId);
  return User.findAll({
    where: { id: { [Op.in]: ids } },
    attributes: ['id', 'displayName'],
    order: [['displayName', 'ASC']],
  });
}
