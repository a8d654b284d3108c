import { Link, useNavigate } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useClub } from '@/features/club/api/get-club';
import { useOpenWatch } from '@/features/storm/api/manage-watch';
import { WatchForm } from '@/features/storm/components/watch-form';

function StormNewScreen() {
  const club = useClub();
  const open = useOpenWatch();
  const navigate = useNavigate();
  return (
    <Page
      title="Open a storm watch"
      width="wide"
      intro={
        <p>
          Every member gets a notice and an e-mail. Take the figures from the official forecast and
          follow the harbour master’s instructions.
        </p>
      }
    >
      <p>
        <Link to={paths.storm.href()}>Back to storm watches</Link>
      </p>
      <WatchForm
        harbors={club.data?.harbors ?? []}
        isPending={open.isPending}
        onSubmit={async (input) => {
          const watch = await open.mutateAsync(input);
          await navigate(paths.stormWatch.href(watch.id));
        }}
      />
    </Page>
  );
}

/** Opening a storm watch (moderators and admins). */
export function StormNewRoute() {
  return (
    <RequireAuth roles={['moderator', 'admin']}>
      <StormNewScreen />
    </RequireAuth>
  );
}
