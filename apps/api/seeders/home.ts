import { planComponentsFrom, recommendTackle } from '@app/calc';
import { Boat, Notification, TacklePlan } from '../src/models';
import type { AreaSeeder } from './seed-context';

const DAY_MS = 86_400_000;
const WIND_KN = 30;
const DEPTH_M = 6;
const TIDE_M = 1;

/**
 * What a member's home shows for Oriel: Saltcress's everyday plan saved from the recommendation (as "Save as
 * plan" does) and two unread notices. Runs after the knowledge seeder, whose posts the notices link to.
 */
export const seedHome: AreaSeeder = async ({ transaction, users, now }) => {
  const oriel = users.get('oriel@larkspit.example');
  const boat = await Boat.findOne({ where: { name: 'Saltcress' }, transaction });
  if (!oriel || !boat) return;
  const rec = recommendTackle({
    loaM: boat.loaM,
    hull: boat.hull,
    windKn: WIND_KN,
    anchorType: 'plow',
    depthM: DEPTH_M,
    tideM: TIDE_M,
    bowHeightM: boat.bowHeightM,
    extrapolate: true,
    ...(boat.beamM === null ? {} : { beamM: boat.beamM }),
    ...(boat.displacementKg === null ? {} : { displacementKg: boat.displacementKg }),
    ...(boat.gypsy ? { gypsy: boat.gypsy } : {}),
  });
  const components = planComponentsFrom(rec);
  await TacklePlan.create(
    {
      boatId: boat.id,
      ownerId: oriel.id,
      name: 'Everyday, 30 kn',
      condition: 'everyday',
      windKn: WIND_KN,
      depthM: DEPTH_M,
      tideM: TIDE_M,
      bottom: null,
      components: { ...components, connectors: components.connectors ?? [] },
      notes: '',
    },
    { transaction },
  );
  const at = (days: number) => new Date(now.getTime() - days * DAY_MS);
  for (const [message, daysAgo] of [
    ['Welcome back: the spring lift-in list is open at the clubhouse', 2],
    ['New comment on a question you follow', 1],
  ] as const)
    await Notification.create(
      {
        userId: oriel.id,
        kind: 'reply',
        message,
        link: '/knowledge',
        readAt: null,
        createdAt: at(daysAgo),
      },
      { transaction },
    );
};
