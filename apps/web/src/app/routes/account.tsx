import { formatDate } from '@app/shared/locale';
import type { UserDto } from '@app/shared';
import { Page } from '@/components/ui/page';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { AccountProfileForm } from '@/features/auth/components/account-profile-form';
import { ChangePasswordForm } from '@/features/auth/components/change-password-form';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { DigestSetting } from '@/features/auth/components/digest-setting';

function AccountScreen({ user }: { user: UserDto }) {
  return (
    <Page title="Your account" width="narrow">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="font-bold">E-mail</dt>
        <dd className="break-all">{user.email}</dd>
        <dt className="font-bold">Member since</dt>
        <dd>{formatDate(user.memberSince)}</dd>
        <dt className="font-bold">Roles</dt>
        <dd>{user.roles.length > 0 ? user.roles.join(', ') : 'none yet'}</dd>
      </dl>
      <section aria-labelledby="profile-heading" className="flex flex-col gap-3">
        <h2 id="profile-heading" className="text-xl">
          Profile
        </h2>
        <AccountProfileForm key={user.id} user={user} />
      </section>
      <section aria-labelledby="digest-heading" className="flex flex-col gap-3">
        <h2 id="digest-heading" className="text-xl">
          E-mail digest
        </h2>
        <DigestSetting user={user} />
      </section>
      <section aria-labelledby="password-heading" className="flex flex-col gap-3">
        <h2 id="password-heading" className="text-xl">
          Password
        </h2>
        <ChangePasswordForm />
      </section>
    </Page>
  );
}

function SignedInAccount() {
  const { user } = useCurrentUser();
  return user ? <AccountScreen user={user} /> : null;
}

/** The signed-in person's details, name, units and password. */
export function AccountRoute() {
  return (
    <RequireAuth>
      <SignedInAccount />
    </RequireAuth>
  );
}
