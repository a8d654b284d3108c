import type { PostDetailDto } from '@app/shared';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/form-errors';
import { useModerate } from '../api/decide';
import { useReasonDialog } from './reason-dialog';

/** Moderator tools on a post page: decide a pending post; pin, lock or hide a published one. */
export function PostModerationBar({ post }: { post: PostDetailDto }) {
  const moderate = useModerate();
  const { askReason, dialog } = useReasonDialog();
  const decide = async (action: 'approve' | 'reject' | 'request-changes') => {
    const reason =
      action === 'approve'
        ? ''
        : await askReason(
            action === 'reject'
              ? {
                  title: 'Reject this post?',
                  hint: 'Why is it not approved? The author reads this and keeps their text.',
                  confirmLabel: 'Reject post',
                  isDestructive: true,
                }
              : {
                  title: 'Ask for changes?',
                  hint: 'What should the author change? They read this.',
                  confirmLabel: 'Send back',
                },
          );
    if (reason === null) return;
    moderate.mutate({ kind: 'post', id: post.id, body: { action, reason } });
  };
  const flag = async (change: { pinned?: boolean; locked?: boolean; hidden?: boolean }) => {
    const reason = change.hidden
      ? await askReason({
          title: 'Hide this post?',
          hint: 'Why hide it? The author reads this.',
          confirmLabel: 'Hide post',
          isDestructive: true,
        })
      : '';
    if (reason === null) return;
    moderate.mutate({ kind: 'flags', id: post.id, body: { ...change, reason } });
  };
  return (
    <div
      role="group"
      aria-label="Moderator tools"
      className="flex flex-wrap items-center gap-2 rounded-md border border-dashed border-ink-600 p-2"
    >
      <span className="text-sm font-bold">Moderator:</span>
      {(post.status === 'pending' || post.revision?.status === 'pending') && (
        <>
          <Button size="sm" onClick={() => void decide('approve')} isPending={moderate.isPending}>
            Approve
          </Button>
          <Button size="sm" variant="secondary" onClick={() => void decide('request-changes')}>
            Request changes
          </Button>
          <Button size="sm" variant="danger" onClick={() => void decide('reject')}>
            Reject
          </Button>
        </>
      )}
      {(post.status === 'approved' || post.status === 'hidden') && (
        <>
          <Button size="sm" variant="secondary" onClick={() => void flag({ pinned: !post.pinned })}>
            {post.pinned ? 'Unpin' : 'Pin'}
          </Button>
          <Button size="sm" variant="secondary" onClick={() => void flag({ locked: !post.locked })}>
            {post.locked ? 'Unlock' : 'Lock'}
          </Button>
          <Button
            size="sm"
            variant="danger"
            onClick={() => void flag({ hidden: post.status !== 'hidden' })}
          >
            {post.status === 'hidden' ? 'Unhide' : 'Hide'}
          </Button>
        </>
      )}
      {moderate.isError && (
        <p role="alert" className="text-sm font-bold text-flare-700">
          {errorMessage(moderate.error)}
        </p>
      )}
      {dialog}
    </div>
  );
}
