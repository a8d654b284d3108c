import { Link, useParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useThread } from '@/features/messages/api/get-thread';
import { MessageForm } from '@/features/messages/components/message-form';
import { ThreadView } from '@/features/messages/components/thread-view';

function ThreadScreen({ id }: { id: number }) {
  const thread = useThread(id);
  if (thread.isPending) return <Spinner label="Loading the conversation…" />;
  if (thread.isError)
    return (
      <UnavailablePage
        title="Conversation not available"
        back={{ to: paths.messages.href(), label: 'Back to your messages' }}
      >
        {errorMessage(thread.error)}
      </UnavailablePage>
    );
  const t = thread.data;
  return (
    <Page
      title={t.listingTitle}
      intro={
        <p>
          With {t.otherParty.displayName} ({t.role === 'buyer' ? 'seller' : 'buyer'}).
        </p>
      }
    >
      <div className="flex flex-wrap gap-4 text-sm">
        <Link to={paths.messages.href()}>← All messages</Link>
        <Link to={paths.listing.href(t.listingId)}>Open the listing</Link>
      </div>
      {t.soldToThisThread && (
        <Alert tone="success">
          The seller marked this listing sold {t.role === 'buyer' ? 'to you' : 'to this buyer'}.
        </Alert>
      )}
      <ThreadView thread={t} />
      <MessageForm threadId={t.id} label="Reply" submitLabel="Send reply" />
      <p className="text-xs text-ink-600">
        Meet in the harbour to hand over gear. Never send money to someone you have not met.
      </p>
    </Page>
  );
}

/** One conversation. */
export function InboxThreadRoute() {
  const { threadId } = useParams();
  return (
    <RequireAuth>
      <ThreadScreen id={Number(threadId)} />
    </RequireAuth>
  );
}
