import { Link, useParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useConversation } from '@/features/conversations/api/get-conversation';
import { MessageForm } from '@/features/conversations/components/message-form';
import { ConversationView } from '@/features/conversations/components/conversation-view';

function ConversationScreen({ id }: { id: number }) {
  const thread = useConversation(id);
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
      <ConversationView thread={t} />
      <MessageForm threadId={t.id} label="Reply" submitLabel="Send reply" />
      <p className="text-xs text-ink-600">
        Meet in the harbour to hand over gear. Never send money to someone you have not met.
      </p>
    </Page>
  );
}

/** One conversation. */
export function ConversationRoute() {
  const { conversationId } = useParams();
  return (
    <RequireAuth>
      <ConversationScreen id={Number(conversationId)} />
    </RequireAuth>
  );
}
