import { isAdmin, isModeratorOrAdmin, type Actor } from './roles';

/** The moderator who made a decision, or any admin, may undo it (within the undo window). */
export const canUndoDecision = (user: Actor, decision: { actorId: number }) =>
  decision.actorId === user.id || isAdmin(user);

/** Storm watches are opened, changed and closed by moderators and admins. */
export const canManageStormWatch = (user: Actor) => isModeratorOrAdmin(user);
