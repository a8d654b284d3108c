import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useClub } from '@/features/club/api/get-club';
import { ClubLocaleForm } from '@/features/club/components/club-locale-form';
import { AdminSections } from '../layout/admin-sections';

function AdminClubScreen() {
  const club = useClub();
  return (
    <Page
      title="Club locale"
      intro={<p>How {club.data?.name ?? 'the club'} writes dates, numbers and money.</p>}
    >
      <AdminSections />
      {club.data ? (
        <ClubLocaleForm initial={club.data.locale} />
      ) : club.isError ? (
        <p role="alert">The club settings could not be loaded. Reload the page to try again.</p>
      ) : (
        <Spinner label="Loading the club settings" />
      )}
    </Page>
  );
}

/** Admins set the club's region, currency and default units. */
export function AdminClubRoute() {
  return (
    <RequireAuth roles={['admin']}>
      <AdminClubScreen />
    </RequireAuth>
  );
}
