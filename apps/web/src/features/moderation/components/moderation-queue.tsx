import type { ModerationQueueDto } from '@app/shared';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { errorMessage } from '../../../lib/form-errors';
import { useModerate } from '../api/decide';
import { useReasonDialog } from './reason-dialog';

export interface ModerationQueueProps {
  queue: ModerationQueueDto;
  postHref: (postId: number) => string;
  /** Rendered after the post and comment reports (the exchange's listing reports). */
  children?: ReactNode;
}

/** The moderators' queue: pending posts, pending comments and open reports, each with its decisions. */
export function ModerationQueue({ queue, postHref, children }: ModerationQueueProps) {
  const moderate = useModerate();
  const { askReason, askNote, dialog } = useReasonDialog();
  const decidePost = async (
    p: { id: number; title: string },
    action: 'approve' | 'reject' | 'request-changes',
  ) => {
    const reason =
      action === 'approve'
        ? ''
        : await askReason(
            action === 'reject'
              ? {
                  title: `Reject “${p.title}”?`,
                  hint: 'Why is it not approved? The author reads this and keeps their text.',
                  confirmLabel: 'Reject post',
                  isDestructive: true,
                }
              : {
                  title: `Ask for changes to “${p.title}”?`,
                  hint: 'What should the author change? They read this.',
                  confirmLabel: 'Send back',
                },
          );
    if (reason !== null) moderate.mutate({ kind: 'post', id: p.id, body: { action, reason } });
  };
  const decideComment = async (id: number, action: 'approve' | 'reject') => {
    const reason =
      action === 'approve'
        ? ''
        : await askReason({
            title: 'Reject this comment?',
            hint: 'Why is it not approved? The author reads this.',
            confirmLabel: 'Reject comment',
            isDestructive: true,
          });
    if (reason !== null) moderate.mutate({ kind: 'comment', id, body: { action, reason } });
  };
  const resolve = async (id: number, outcome: 'dismiss' | 'hide-target', what: string) => {
    const note = await askNote({
      title: outcome === 'dismiss' ? 'Dismiss this report?' : `Hide the reported ${what}?`,
      hint: 'Only moderators read the note, in the log.',
      confirmLabel: outcome === 'dismiss' ? 'Dismiss report' : `Hide ${what}`,
      isDestructive: outcome === 'hide-target',
    });
    if (note !== null) moderate.mutate({ kind: 'report', id, body: { outcome, note } });
  };
  return (
    <div className="flex flex-col gap-6">
      {moderate.isError && (
        <Alert tone="error">
          <p>{errorMessage(moderate.error)}</p>
        </Alert>
      )}
      <section aria-labelledby="q-posts" className="flex flex-col gap-2">
        <h2 id="q-posts" className="text-xl">
          Posts waiting ({queue.posts.length})
        </h2>
        {queue.posts.length === 0 && <p>Nothing waiting.</p>}
        <ul className="flex flex-col gap-3">
          {queue.posts.map((p) => (
            <li
              key={p.id}
              className="flex flex-col gap-2 rounded-md border border-sand-500 bg-sand-50 p-3"
            >
              <p className="text-xs text-ink-600">
                {p.kind} · {p.topic?.name} · by {p.author.displayName}
              </p>
              <Link to={postHref(p.id)} className="text-lg font-bold underline">
                {p.title}
              </Link>
              <p className="text-sm text-ink-700">{p.excerpt}</p>
              <div className="flex flex-wrap gap-2">
                <Button
                  size="sm"
                  onClick={() => void decidePost(p, 'approve')}
                  aria-label={`Approve “${p.title}”`}
                >
                  Approve
                </Button>
                <Button
                  size="sm"
                  variant="secondary"
                  onClick={() => void decidePost(p, 'request-changes')}
                >
                  Request changes
                </Button>
                <Button size="sm" variant="danger" onClick={() => void decidePost(p, 'reject')}>
                  Reject
                </Button>
              </div>
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="q-comments" className="flex flex-col gap-2">
        <h2 id="q-comments" className="text-xl">
          Comments waiting ({queue.comments.length})
        </h2>
        {queue.comments.length === 0 && <p>Nothing waiting.</p>}
        <ul className="flex flex-col gap-3">
          {queue.comments.map((c) => (
            <li
              key={c.id}
              className="flex flex-col gap-2 rounded-md border border-sand-500 bg-sand-50 p-3"
            >
              <p className="text-xs text-ink-600">
                {c.author.displayName} on{' '}
                <Link to={postHref(c.postId)} className="underline">
                  {c.postTitle}
                </Link>
              </p>
              <p className="whitespace-pre-line">{c.body}</p>
              <div className="flex gap-2">
                <Button size="sm" onClick={() => void decideComment(c.id, 'approve')}>
                  Approve
                </Button>
                <Button
                  size="sm"
                  variant="danger"
                  onClick={() => void decideComment(c.id, 'reject')}
                >
                  Reject
                </Button>
              </div>
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="q-reports" className="flex flex-col gap-2">
        <h2 id="q-reports" className="text-xl">
          Reports ({queue.reports.length})
        </h2>
        {queue.reports.length === 0 && <p>No open reports.</p>}
        <ul className="flex flex-col gap-3">
          {queue.reports.map((r) => (
            <li
              key={r.id}
              className="flex flex-col gap-2 rounded-md border border-flare-700 bg-sand-50 p-3"
            >
              <p className="text-xs text-ink-600">
                {r.reporter.displayName} reported a {r.targetType}
                {r.postId ? (
                  <>
                    {' '}
                    on{' '}
                    <Link to={postHref(r.postId)} className="underline">
                      {r.targetTitle}
                    </Link>
                  </>
                ) : null}
              </p>
              <blockquote className="border-l-4 border-sand-500 pl-2 text-sm">
                {r.targetExcerpt}
              </blockquote>
              <p className="text-sm">
                <strong>Reason:</strong> {r.reason}
              </p>
              <div className="flex gap-2">
                <Button
                  size="sm"
                  variant="danger"
                  onClick={() => void resolve(r.id, 'hide-target', r.targetType)}
                >
                  Hide the {r.targetType}
                </Button>
                <Button
                  size="sm"
                  variant="secondary"
                  onClick={() => void resolve(r.id, 'dismiss', r.targetType)}
                >
                  Dismiss
                </Button>
              </div>
            </li>
          ))}
        </ul>
      </section>
      {children}
      {dialog}
    </div>
  );
}
