import type { Actor } from './roles';

/** A tackle plan is its owner's: anyone else's reads as not found. */
export const ownsTacklePlan = (user: Actor, plan: { ownerId: number }) => plan.ownerId === user.id;
