import { isTreasurer, type Actor } from './roles';

/** Plans, the roster, payments recorded by hand, refunds and reminders are the treasurer's (route check). */
export const canManageTreasury = (user: Actor) => isTreasurer(user);

/** A member's own payment (a checkout they opened); anyone else's reads as not found. */
export const ownsPayment = (user: Actor, payment: { userId: number }) => payment.userId === user.id;
