import type { PostDetailDto } from '@app/shared';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/form-errors';
import { useModerate } from '../api/decide';
import { askReason } from './reason-dialog';

/** Moderator tools on a post page: decide a pending post; pin, lock or hide a published one. */
export function PostModerationBar({ post }: { post: PostDetailDto }) {
  const moderate = useModerate();
  const decide = (action: 'approve' | 'reject' | 'request-changes') => {
    const reason =
      action === 'approve'
        ? ''
        : askReason(
            action === 'reject'
              ? 'Why is it not approved? The author reads this.'
              : 'What should the author change?',
          );
    if (reason === null) return;
    moderate.mutate({ kind: 'post', id: post.id, body: { action, reason } });
  };
  const flag = (change: { pinned?: boolean; locked?: boolean; hidden?: boolean }) => {
    const reason = change.hidden ? askReason('Why hide this post? The author reads this.') : '';
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
      {post.status === 'pending' && (
        <>
          <Button size="sm" onClick={() => decide('approve')} isPending={moderate.isPending}>
            Approve
          </Button>
          <Button size="sm" variant="secondary" onClick={() => decide('request-changes')}>
            Request changes
          </Button>
          <Button size="sm" variant="danger" onClick={() => decide('reject')}>
            Reject
          </Button>
        </>
      )}
      {(post.status === 'approved' || post.status === 'hidden') && (
        <>
          <Button size="sm" variant="secondary" onClick={() => flag({ pinned: !post.pinned })}>
            {post.pinned ? 'Unpin' : 'Pin'}
          </Button>
          <Button size="sm" variant="secondary" onClick={() => flag({ locked: !post.locked })}>
            {post.locked ? 'Unlock' : 'Lock'}
          </Button>
          <Button
            size="sm"
            variant="danger"
            onClick={() => flag({ hidden: post.status !== 'hidden' })}
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
    </div>
  );
}
