import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useNotices } from '@/features/notices/api/get-notices';
import { useMarkAllNoticesRead, useMarkNoticeRead } from '@/features/notices/api/mark-read';
import { NoticeList } from '@/features/notices/components/notice-list';

function NoticesScreen() {
  const notices = useNotices();
  const markAll = useMarkAllNoticesRead();
  const markOne = useMarkNoticeRead();
  const { user } = useCurrentUser();
  const unread = notices.data?.filter((n) => n.readAt === null).length ?? 0;
  return (
    <Page
      title="Notices"
      intro={
        <p>
          Replies to your posts and comments, answers that worked for the asker and moderators’
          decisions
          {unread ? ` · ${unread} unread` : ''}.{' '}
          {user?.notificationDigest ? (
            'You also get a daily e-mail of what is unread.'
          ) : (
            <>
              Want them by e-mail too? Turn on the daily digest on your{' '}
              <Link to={paths.account.href()}>account page</Link>.
            </>
          )}
        </p>
      }
    >
      {notices.isPending && <Spinner label="Loading your notices…" />}
      {notices.isError && <Alert tone="error">{errorMessage(notices.error)}</Alert>}
      {markAll.isError && <Alert tone="error">{errorMessage(markAll.error)}</Alert>}
      {notices.data?.length === 0 && (
        <EmptyState title="No notices yet">
          When someone replies to you, accepts your answer or a moderator decides on your post, it
          shows here.
        </EmptyState>
      )}
      {notices.data && notices.data.length > 0 && (
        <>
          {unread > 0 && (
            <Button
              variant="secondary"
              className="self-start"
              isPending={markAll.isPending}
              pendingLabel="Marking…"
              onClick={() => markAll.mutate()}
            >
              Mark all {unread} as read
            </Button>
          )}
          <NoticeList notices={notices.data} onOpen={(n) => markOne.mutate(n.id)} />
        </>
      )}
    </Page>
  );
}

/** The member's in-app notices. */
export function NoticesRoute() {
  return (
    <RequireAuth>
      <NoticesScreen />
    </RequireAuth>
  );
}
