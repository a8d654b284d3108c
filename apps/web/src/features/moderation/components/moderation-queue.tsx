import type {
  ModerationQueueDto,
  PostDecision,
  PostSummaryDto,
  QueueCommentDto,
  ReportDto,
} from '@app/shared';
import type { MouseEvent, ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { DecidedLine, DeskAlerts } from './decision-desk';
import { cardHeight, keptHeight, useDecisionDesk, useKeptInPlace } from './use-decision-desk';
import { POST_DECISION_WORDS } from './decision-words';
import { useReasonDialog } from './reason-dialog';

export interface ModerationQueueProps {
  queue: ModerationQueueDto;
  postHref: (postId: number) => string;
  /** Rendered after the post and comment reports (the exchange's listing reports). */
  children?: ReactNode;
}

const postKey = (p: PostSummaryDto) => `post:${p.id}`;
const commentKey = (c: QueueCommentDto) => `comment:${c.id}`;
const reportKey = (r: ReportDto) => `report:${r.id}`;

/**
 * The moderators' queue: waiting posts, waiting comments and open reports, each with its decisions. A decided
 * item stays in place, as tall as it was, saying what happened with an Undo, until the moderator leaves.
 */
export function ModerationQueue({ queue, postHref, children }: ModerationQueueProps) {
  const desk = useDecisionDesk();
  const { askReason, askNote, dialog } = useReasonDialog();
  const posts = useKeptInPlace(queue.posts, postKey, desk.kept);
  const comments = useKeptInPlace(queue.comments, commentKey, desk.kept);
  const reports = useKeptInPlace(queue.reports, reportKey, desk.kept);

  const decidePost = async (p: PostSummaryDto, action: PostDecision, e: MouseEvent) => {
    const words = POST_DECISION_WORDS[action];
    const height = cardHeight(e);
    const reason = words.ask ? await askReason(words.ask(p.title)) : '';
    if (reason === null) return;
    await desk.decide(
      postKey(p),
      p.title,
      words.done,
      {
        kind: 'post',
        id: p.id,
        body: { action, reason },
      },
      height,
    );
  };
  const decideComment = async (
    c: QueueCommentDto,
    action: 'publish' | 'decline',
    e: MouseEvent,
  ) => {
    const height = cardHeight(e);
    const reason =
      action === 'publish'
        ? ''
        : await askReason({
            title: 'Decline this comment?',
            hint: 'Why is it not published? The author reads this.',
            confirmLabel: 'Decline comment',
            isDestructive: true,
          });
    if (reason === null) return;
    await desk.decide(
      commentKey(c),
      c.postTitle,
      action === 'publish' ? 'Comment published' : 'Comment declined',
      { kind: 'comment', id: c.id, body: { action, reason } },
      height,
    );
  };
  const resolve = async (r: ReportDto, outcome: 'dismiss' | 'hide-target', e: MouseEvent) => {
    const height = cardHeight(e);
    const what = r.targetType;
    const note = await askNote({
      title: outcome === 'dismiss' ? 'Dismiss this report?' : `Hide the reported ${what}?`,
      hint: 'Only moderators read the note, in the log.',
      confirmLabel: outcome === 'dismiss' ? 'Dismiss report' : `Hide ${what}`,
      isDestructive: outcome === 'hide-target',
    });
    if (note === null) return;
    await desk.decide(
      reportKey(r),
      r.targetTitle,
      outcome === 'dismiss' ? 'Report dismissed' : `The ${what} is hidden`,
      { kind: 'report', id: r.id, body: { outcome, note } },
      height,
    );
  };
  const waitingPosts = queue.posts.length;
  return (
    <div className="flex flex-col gap-6">
      <DeskAlerts desk={desk} />
      <section aria-labelledby="q-posts" className="flex flex-col gap-2">
        <h2 id="q-posts" className="text-xl">
          Posts waiting ({waitingPosts})
        </h2>
        {posts.length === 0 && <p>Nothing waiting.</p>}
        <ul className="flex flex-col gap-3">
          {posts.map((p) => {
            const key = postKey(p);
            const decided = desk.decidedOf(key);
            return (
              <li
                key={key}
                style={keptHeight(decided)}
                className="flex flex-col gap-2 rounded-md border border-sand-500 bg-sand-50 p-3"
              >
                <p className="text-xs text-ink-600">
                  {p.kind} · {p.topic?.name} · by {p.author.displayName}
                  {p.status === 'approved' ? ' · edit of a published post' : ''}
                </p>
                <Link to={postHref(p.id)} className="text-lg font-bold underline">
                  {p.title}
                </Link>
                <p className="text-sm text-ink-700">{p.excerpt}</p>
                {decided ? (
                  <DecidedLine desk={desk} itemKey={key} title={p.title} />
                ) : (
                  <div className="flex flex-wrap gap-2">
                    <Button
                      size="sm"
                      variant="primary"
                      isPending={desk.isPending(key)}
                      onClick={(e) => void decidePost(p, 'publish', e)}
                      aria-label={`Publish “${p.title}”`}
                    >
                      {POST_DECISION_WORDS.publish.button}
                    </Button>
                    <Button
                      size="sm"
                      variant="secondary"
                      disabled={desk.isPending(key)}
                      onClick={(e) => void decidePost(p, 'send-back', e)}
                      aria-label={`Send back “${p.title}”`}
                    >
                      {POST_DECISION_WORDS['send-back'].button}
                    </Button>
                    <Button
                      size="sm"
                      variant="refuse"
                      className="sm:ml-auto"
                      disabled={desk.isPending(key)}
                      onClick={(e) => void decidePost(p, 'decline', e)}
                      aria-label={`Decline “${p.title}”`}
                    >
                      {POST_DECISION_WORDS.decline.button}
                    </Button>
                  </div>
                )}
              </li>
            );
          })}
        </ul>
      </section>
      <section aria-labelledby="q-comments" className="flex flex-col gap-2">
        <h2 id="q-comments" className="text-xl">
          Comments waiting ({queue.comments.length})
        </h2>
        {comments.length === 0 && <p>Nothing waiting.</p>}
        <ul className="flex flex-col gap-3">
          {comments.map((c) => {
            const key = commentKey(c);
            const decided = desk.decidedOf(key);
            return (
              <li
                key={key}
                style={keptHeight(decided)}
                className="flex flex-col gap-2 rounded-md border border-sand-500 bg-sand-50 p-3"
              >
                <p className="text-xs text-ink-600">
                  {c.author.displayName} on{' '}
                  <Link to={postHref(c.postId)} className="underline">
                    {c.postTitle}
                  </Link>
                </p>
                <p className="whitespace-pre-line">{c.body}</p>
                {decided ? (
                  <DecidedLine desk={desk} itemKey={key} title={c.postTitle} />
                ) : (
                  <div className="flex flex-wrap gap-2">
                    <Button
                      size="sm"
                      isPending={desk.isPending(key)}
                      aria-label={`Publish the comment by ${c.author.displayName}`}
                      onClick={(e) => void decideComment(c, 'publish', e)}
                    >
                      Publish
                    </Button>
                    <Button
                      size="sm"
                      variant="refuse"
                      className="sm:ml-auto"
                      disabled={desk.isPending(key)}
                      aria-label={`Decline the comment by ${c.author.displayName}`}
                      onClick={(e) => void decideComment(c, 'decline', e)}
                    >
                      Decline…
                    </Button>
                  </div>
                )}
              </li>
            );
          })}
        </ul>
      </section>
      <section aria-labelledby="q-reports" className="flex flex-col gap-2">
        <h2 id="q-reports" className="text-xl">
          Reports ({queue.reports.length})
        </h2>
        {reports.length === 0 && <p>No open reports.</p>}
        <ul className="flex flex-col gap-3">
          {reports.map((r) => {
            const key = reportKey(r);
            const decided = desk.decidedOf(key);
            return (
              <li
                key={key}
                style={keptHeight(decided)}
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
                {decided ? (
                  <DecidedLine desk={desk} itemKey={key} title={r.targetTitle} />
                ) : (
                  <div className="flex flex-wrap gap-2">
                    <Button
                      size="sm"
                      variant="secondary"
                      disabled={desk.isPending(key)}
                      onClick={(e) => void resolve(r, 'dismiss', e)}
                    >
                      Dismiss
                    </Button>
                    <Button
                      size="sm"
                      variant="refuse"
                      className="sm:ml-auto"
                      disabled={desk.isPending(key)}
                      onClick={(e) => void resolve(r, 'hide-target', e)}
                    >
                      Hide the {r.targetType}
                    </Button>
                  </div>
                )}
              </li>
            );
          })}
        </ul>
      </section>
      {children}
      {dialog}
    </div>
  );
}
