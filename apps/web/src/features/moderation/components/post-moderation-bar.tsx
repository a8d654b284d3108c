import type { PostDecision, PostDetailDto } from '@app/shared';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { errorMessage } from '@/lib/form-errors';
import { useModerate, useUndoDecision } from '../api/decide';
import { POST_DECISION_WORDS } from './decision-words';
import { useReasonDialog } from './reason-dialog';

/** Moderator tools on a post page: decide a pending post; pin, lock or hide a published one. */
export function PostModerationBar({ post }: { post: PostDetailDto }) {
  const moderate = useModerate();
  const { askReason, dialog } = useReasonDialog();
  const [lastDecision, setLastDecision] = useState<{ id: number; done: string } | null>(null);
  const undo = useUndoDecision();
  const decide = async (action: PostDecision) => {
    const words = POST_DECISION_WORDS[action];
    const reason = words.ask ? await askReason(words.ask(post.title)) : '';
    if (reason === null) return;
    undo.reset();
    const res = await moderate.mutateAsync({ kind: 'post', id: post.id, body: { action, reason } });
    if (res?.decisionId) setLastDecision({ id: res.decisionId, done: words.done });
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
          <Button
            size="sm"
            onClick={() => void decide('publish').catch(() => undefined)}
            isPending={moderate.isPending}
          >
            {POST_DECISION_WORDS.publish.button}
          </Button>
          <Button
            size="sm"
            variant="secondary"
            onClick={() => void decide('send-back').catch(() => undefined)}
          >
            {POST_DECISION_WORDS['send-back'].button}
          </Button>
          <Button
            size="sm"
            variant="refuse"
            onClick={() => void decide('decline').catch(() => undefined)}
          >
            {POST_DECISION_WORDS.decline.button}
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
      {lastDecision && (
        <p role="status" className="flex items-center gap-2 text-sm">
          <span className="font-bold text-kelp-700">{lastDecision.done}.</span>
          <Button
            size="sm"
            variant="ghost"
            className="underline"
            isPending={undo.isPending}
            onClick={() => undo.mutate(lastDecision.id, { onSuccess: () => setLastDecision(null) })}
          >
            Undo
          </Button>
        </p>
      )}
      {undo.isError && (
        <p role="alert" className="text-sm font-bold text-flare-700">
          {errorMessage(undo.error)}
        </p>
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
