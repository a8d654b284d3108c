import type { z } from 'zod';
import { Op } from 'sequelize';
import type {
  ReadinessDto,
  ReadinessStatus,
  StormCheckDto,
  readinessInputSchema,
} from '@app/shared';
import { invalid, notFound } from '../../errors/app-error';
import { Boat, StormReadiness, TacklePlan, User, UserRole, type StormWatch } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { notify } from '../posts/notifications.service';
import { stormCheck } from './storm-check';
import { getOpenWatch, getWatch } from './storm.service';
import { canManageStormWatch } from '../../policies/moderation';
import { ownsBoat } from '../../policies/boats';
import { ownsTacklePlan } from '../../policies/tackle-plans';

type ReadinessInput = z.output<typeof readinessInputSchema>;

/**
 * The board's status of one boat, derived from its readiness row and its plan's check: a boat whose plan is
 * loaded past a working load limit at the forecast gust is never "ready".
 */
export function statusOf(
  r: StormReadiness | undefined,
  watch: StormWatch,
  check: StormCheckDto | null,
): ReadinessStatus {
  if (!r || r.filledAt === null) return 'not-started';
  if (r.helpWanted) return 'help-wanted';
  if (r.location === 'leaving') return 'away';
  const allTicked = watch.checklist.every((i) => r.ticked.includes(i.id));
  const hasPlan = r.location !== 'own-anchor' || r.planId !== null;
  const planHolds = check === null || check.band !== 'below-wll';
  return r.location !== null && allTicked && hasPlan && planHolds ? 'ready' : 'in-progress';
}

interface Row {
  boat: Boat & { owner?: User };
  readiness: StormReadiness | undefined;
  plan: TacklePlan | null;
}

/** Whether `viewer` may see the details of this boat's readiness, not only its name and status. */
function seesDetails(viewer: User, watch: StormWatch, row: Row) {
  return (
    ownsBoat(viewer, row.boat) ||
    row.readiness?.buddyUserId === viewer.id ||
    canManageStormWatch(viewer) ||
    watch.shareDetails
  );
}

function toReadinessDto(viewer: User, watch: StormWatch, row: Row): ReadinessDto {
  const { boat, readiness: r, plan } = row;
  const buddy = r?.buddy ?? null;
  const check = plan ? stormCheck(boat, plan, watch, r?.depthM ?? null) : null;
  return {
    boatId: boat.id,
    boatName: boat.name,
    ownerId: boat.ownerId,
    ownerName: boat.owner?.displayName ?? '',
    harborId: boat.homeHarborId,
    status: statusOf(r, watch, check),
    mine: boat.ownerId === viewer.id,
    details: seesDetails(viewer, watch, row)
      ? {
          location: r?.location ?? null,
          planId: r?.planId ?? null,
          depthM: r?.depthM ?? null,
          ticked: r?.ticked ?? [],
          helpWanted: r?.helpWanted ?? false,
          helpNote: r?.helpNote ?? '',
          buddy: buddy ? { id: buddy.id, name: buddy.displayName } : null,
          check,
          updatedAt: r?.filledAt?.toISOString() ?? null,
        }
      : null,
  };
}

const BOAT_INCLUDE = [{ model: User, as: 'owner', attributes: ['id', 'displayName'] }];
const READINESS_INCLUDE = [{ model: User, as: 'buddy', attributes: ['id', 'displayName'] }];

/** Boats and readiness rows, joined, with each row's plan. */
async function rowsFor(watch: StormWatch, boats: Boat[]): Promise<Row[]> {
  const readiness = await StormReadiness.findAll({
    where: { watchId: watch.id, boatId: boats.map((b) => b.id) },
    include: READINESS_INCLUDE,
  });
  const byBoat = new Map(readiness.map((r) => [r.boatId, r]));
  const planIds = readiness.map((r) => r.planId).filter((id): id is number => id !== null);
  const plans = new Map(
    (await TacklePlan.findAll({ where: { id: planIds } })).map((p) => [p.id, p]),
  );
  return boats.map((boat) => {
    const r = byBoat.get(boat.id);
    return { boat, readiness: r, plan: r?.planId ? (plans.get(r.planId) ?? null) : null };
  });
}

/**
 * The board: every boat in the watch's harbours, plus any other boat whose owner filled it in, sorted by
 * harbour and boat name. Members see name and status of others' boats; details as {@link seesDetails} says.
 */
export async function board(viewer: User, watchId: number, harborId?: number) {
  const watch = await getWatch(watchId);
  const filled = await StormReadiness.findAll({
    where: { watchId: watch.id },
    attributes: ['boatId'],
  });
  const boats = await Boat.findAll({
    where: {
      [Op.or]: [{ homeHarborId: watch.harborIds }, { id: filled.map((r) => r.boatId) }],
      ...(harborId ? { homeHarborId: harborId } : {}),
    },
    include: BOAT_INCLUDE,
    order: [['name', 'ASC']],
  });
  const rows = await rowsFor(watch, boats);
  return { watch, rows: rows.map((row) => toReadinessDto(viewer, watch, row)) };
}

/** The viewer's own boats and the boats they are buddy for, for the watch page. */
export async function mineAndBuddied(viewer: User, watch: StormWatch) {
  const own = await Boat.findAll({
    where: { ownerId: viewer.id },
    include: BOAT_INCLUDE,
    order: [['name', 'ASC']],
  });
  const buddied = await StormReadiness.findAll({
    where: { watchId: watch.id, buddyUserId: viewer.id },
    attributes: ['boatId'],
  });
  const theirs = await Boat.findAll({
    where: { id: buddied.map((r) => r.boatId) },
    include: BOAT_INCLUDE,
    order: [['name', 'ASC']],
  });
  return {
    mine: (await rowsFor(watch, own)).map((row) => toReadinessDto(viewer, watch, row)),
    buddyOf: (await rowsFor(watch, theirs)).map((row) => toReadinessDto(viewer, watch, row)),
  };
}

/**
 * One boat's readiness: the owner, the boat's buddy and moderators/admins may read it; anyone else gets
 * NOT_FOUND, so ids leak nothing.
 */
export async function getReadiness(viewer: User, watchId: number, boatId: number) {
  const watch = await getWatch(watchId);
  const boat = await Boat.findByPk(boatId, { include: BOAT_INCLUDE });
  if (!boat) throw notFound('Boat');
  const [row] = await rowsFor(watch, [boat]);
  if (!row) throw notFound('Boat');
  const allowed =
    ownsBoat(viewer, boat) ||
    row.readiness?.buddyUserId === viewer.id ||
    canManageStormWatch(viewer);
  if (!allowed) throw notFound('Boat');
  return { watch, readiness: toReadinessDto(viewer, watch, row) };
}

/** Saves the owner's readiness for one boat; someone else's boat is not found, a closed watch a conflict. */
export async function saveReadiness(
  actor: User,
  watchId: number,
  boatId: number,
  input: ReadinessInput,
) {
  const watch = await getOpenWatch(watchId);
  const boat = await Boat.findByPk(boatId);
  if (!boat || !ownsBoat(actor, boat)) throw notFound('Boat');
  if (input.planId !== null) {
    const plan = await TacklePlan.findByPk(input.planId);
    if (!plan || plan.boatId !== boat.id || !ownsTacklePlan(actor, plan))
      throw invalid({ planId: 'Choose one of this boat’s saved tackle plans' });
  }
  const known = new Set(watch.checklist.map((i) => i.id));
  const unknown = input.ticked.filter((id) => !known.has(id));
  if (unknown.length > 0) throw invalid({ ticked: `Not on this watch’s checklist: ${unknown[0]}` });
  const values = {
    location: input.location,
    planId: input.planId,
    depthM: input.depthM,
    ticked: [...new Set(input.ticked)],
    helpWanted: input.helpWanted,
    helpNote: input.helpNote,
    filledAt: new Date(),
  };
  const existing = await StormReadiness.findOne({ where: { watchId: watch.id, boatId: boat.id } });
  if (existing) await existing.update(values);
  else
    await StormReadiness.create({
      watchId: watch.id,
      boatId: boat.id,
      buddyUserId: null,
      ...values,
    });
  return getReadiness(actor, watch.id, boat.id);
}

/** Names (or clears) the member who checks on a boat (moderator or admin); notifies buddy and owner. Logged. */
export async function setBuddy(
  actor: User,
  watchId: number,
  boatId: number,
  buddyUserId: number | null,
) {
  const watch = await getOpenWatch(watchId);
  const boat = await Boat.findByPk(boatId);
  if (!boat) throw notFound('Boat');
  if (buddyUserId !== null) {
    const isMember = await UserRole.findOne({ where: { userId: buddyUserId, role: 'member' } });
    if (!isMember) throw invalid({ buddyUserId: 'Choose a member of the club' });
    if (buddyUserId === boat.ownerId)
      throw invalid({ buddyUserId: 'A buddy checks someone else’s boat: choose another member' });
  }
  const existing = await StormReadiness.findOne({ where: { watchId: watch.id, boatId: boat.id } });
  if (existing) await existing.update({ buddyUserId });
  else
    await StormReadiness.create({
      watchId: watch.id,
      boatId: boat.id,
      location: null,
      planId: null,
      depthM: null,
      ticked: [],
      helpWanted: false,
      helpNote: '',
      buddyUserId,
      filledAt: null,
    });
  if (buddyUserId !== null) {
    const link = `/storm/${watch.id}`;
    await notify(
      buddyUserId,
      'storm-buddy',
      `You are the storm-watch buddy for ${boat.name} (${watch.name}): check on it.`,
      link,
    );
    await notify(
      boat.ownerId,
      'storm-buddy',
      `A buddy will check on ${boat.name} during ${watch.name}.`,
      link,
    );
  }
  await recordAudit({
    actorId: actor.id,
    area: 'storm',
    action: 'buddy.set',
    subjectType: 'boat',
    subjectId: String(boat.id),
    details: { watchId: watch.id, buddyUserId },
  });
  return getReadiness(actor, watch.id, boat.id);
}
