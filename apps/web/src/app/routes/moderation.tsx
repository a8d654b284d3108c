import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useListingReports } from '@/features/moderation/api/get-listing-reports';
import { useModerationQueue } from '@/features/moderation/api/get-queue';
import { ListingReports } from '@/features/moderation/components/listing-reports';
import { ModerationQueue } from '@/features/moderation/components/moderation-queue';
import { errorMessage } from '@/lib/form-errors';

function QueueScreen() {
  const queue = useModerationQueue();
  if (queue.isPending) return <Spinner label="Loading the queue…" />;
  if (queue.isError)
    return (
      <Alert tone="error">
        <p>{errorMessage(queue.error)}</p>
      </Alert>
    );
  return (
    <ModerationQueue queue={queue.data} postHref={paths.post.href}>
      <ListingReportsSection />
    </ModerationQueue>
  );
}

function ListingReportsSection() {
  const reports = useListingReports();
  if (reports.isPending) return <Spinner label="Loading listing reports…" />;
  if (reports.isError)
    return (
      <Alert tone="error">
        <p>{errorMessage(reports.error)}</p>
      </Alert>
    );
  return <ListingReports reports={reports.data} listingHref={(id) => paths.listing.href(id)} />;
}

/** Moderators approve, reject or send back posts and comments, and resolve reports on posts and listings. */
export function ModerationRoute() {
  return (
    <RequireAuth roles={['moderator']}>
      <Page
        title="Moderation"
        intro={
          <p>
            Every decision is logged with your name.{' '}
            <Link to={paths.moderationLog.href()} className="underline">
              Open the log
            </Link>
            .
          </p>
        }
      >
        <QueueScreen />
      </Page>
    </RequireAuth>
  );
}
