import type { z } from 'zod';
import type { boatInputSchema, boatPatchSchema } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { withParentLocked } from '../../lib/serialize';
import { Boat, Harbor, User } from '../../models';
import { ownsBoat } from '../../policies/boats';

type BoatInput = z.output<typeof boatInputSchema>;
type BoatPatch = z.output<typeof boatPatchSchema>;

export const MAX_BOATS = 20;

/** The actor's boats, newest first. */
export const listBoats = (actor: User) =>
  Boat.findAll({ where: { ownerId: actor.id }, order: [['createdAt', 'DESC']] });

/** One of the actor's boats; someone else's boat is reported as not found (no existence oracle). */
export async function getOwnBoat(actor: User, boatId: number): Promise<Boat> {
  const boat = await Boat.findByPk(boatId);
  if (!boat || !ownsBoat(actor, boat)) throw notFound('Boat');
  return boat;
}

async function checkHarbor(id: number | null | undefined) {
  if (id && !(await Harbor.findByPk(id)))
    throw new AppError('VALIDATION_FAILED', 'Some fields need attention', {
      homeHarborId: 'Choose one of the club harbours',
    });
}

export async function createBoat(actor: User, input: BoatInput) {
  await checkHarbor(input.homeHarborId);
  return withParentLocked(User, actor.id, async (transaction) => {
    const count = await Boat.count({ where: { ownerId: actor.id }, transaction });
    if (count >= MAX_BOATS)
      throw new AppError('CONFLICT', `You can keep at most ${MAX_BOATS} boat profiles`);
    return Boat.create(
      {
        ownerId: actor.id,
        name: input.name,
        hull: input.hull,
        loaM: input.loaM,
        beamM: input.beamM ?? null,
        displacementKg: input.displacementKg ?? null,
        draftM: input.draftM ?? null,
        bowHeightM: input.bowHeightM,
        gypsy: input.gypsy ?? null,
        homeHarborId: input.homeHarborId ?? null,
      },
      { transaction },
    );
  });
}

export async function updateBoat(actor: User, boatId: number, input: BoatPatch) {
  const boat = await getOwnBoat(actor, boatId);
  await checkHarbor(input.homeHarborId);
  return boat.update(input);
}

/** Deletes the boat and (by cascade) its tackle plans. */
export async function deleteBoat(actor: User, boatId: number) {
  const boat = await getOwnBoat(actor, boatId);
  await boat.destroy();
}
