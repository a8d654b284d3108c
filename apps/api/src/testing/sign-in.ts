import type { Role } from '@app/shared';
import type { BuiltApp } from '../app';
import { User } from '../models';
import { grantPaidUp } from './exchange';
import { buildUser } from './builders';
import { client, type Client } from './test-app';

/** Who signs in: a role, several roles, or a user built already. */
export type SignInWho = Role | readonly Role[] | User;

export interface SignedIn {
  user: User;
  c: Client;
}

/**
 * A client signed in as `who`: a new verified member with that role (or roles), or the given user. With
 * `paidUp`, the new member is made paid up through the dues tables first (the exchange's trading rule).
 * Throws when the sign-in is refused, so a test never runs on as a visitor by mistake.
 */
export async function signedInAs(
  built: Pick<BuiltApp, 'app'>,
  who: SignInWho = 'member',
  opts: { paidUp?: boolean } = {},
): Promise<SignedIn> {
  const user =
    who instanceof User
      ? who
      : await buildUser({ roles: typeof who === 'string' ? [who] : [...who] });
  if (opts.paidUp) await grantPaidUp(user);
  const c = await client(built.app);
  const res = await c.signIn(user.email);
  if (res.status !== 200) throw new Error(`sign-in as ${user.email} answered ${res.status}`);
  return { user, c };
}
