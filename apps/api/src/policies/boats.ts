import type { Actor } from './roles';

/** A boat is its owner's: anyone else's reads as not found. */
export const ownsBoat = (user: Actor, boat: { ownerId: number }) => boat.ownerId === user.id;
