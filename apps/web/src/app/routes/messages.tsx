import { Alert } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/empty-state';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useConversations } from '@/features/conversations/api/get-conversations';
import { ConversationList } from '@/features/conversations/components/conversation-list';

function InboxScreen() {
  const threads = useConversations();
  const unread = threads.data?.reduce((n, t) => n + t.unread, 0) ?? 0;
  return (
    <Page
      title="Messages"
      intro={
        <p>
          Conversations about gear you are buying or selling{unread ? ` · ${unread} unread` : ''}.
        </p>
      }
    >
      {threads.isPending && <Spinner label="Loading your messages…" />}
      {threads.isError && <Alert tone="error">{errorMessage(threads.error)}</Alert>}
      {threads.data?.length === 0 && (
        <EmptyState title="No conversations yet">
          Open a listing and message the seller to start one.
        </EmptyState>
      )}
      {threads.data && threads.data.length > 0 && (
        <ConversationList threads={threads.data} hrefOf={paths.conversation.href} />
      )}
    </Page>
  );
}

/** The member's inbox of buyer–seller conversations. */
export function MessagesRoute() {
  return (
    <RequireAuth>
      <InboxScreen />
    </RequireAuth>
  );
}
