import type {
  ModerationQueueDto,
  PostDecision,
  PostSummaryDto,
  QueueCommentDto,
  ReportDto,
} from '@app/shared';
import type { MouseEvent, ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { DeskAlerts } from './decision-desk';
import { DeskCard, DeskSection } from './desk-card';
import { cardHeight, useDecisionDesk, useKeptInPlace } from './use-decision-desk';
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
      <DeskSection id="q-posts" heading={`Posts waiting (${waitingPosts})`} count={posts.length}>
        {posts.map((p) => (
          <DeskCard
            key={postKey(p)}
            desk={desk}
            itemKey={postKey(p)}
            title={p.title}
            actions={[
              {
                label: POST_DECISION_WORDS.publish.button,
                ariaLabel: `Publish “${p.title}”`,
                showsPending: true,
                onClick: (e) => void decidePost(p, 'publish', e),
              },
              {
                label: POST_DECISION_WORDS['send-back'].button,
                ariaLabel: `Send back “${p.title}”`,
                variant: 'secondary',
                onClick: (e) => void decidePost(p, 'send-back', e),
              },
              {
                label: POST_DECISION_WORDS.decline.button,
                ariaLabel: `Decline “${p.title}”`,
                variant: 'refuse',
                onClick: (e) => void decidePost(p, 'decline', e),
              },
            ]}
          >
            <p className="text-xs text-ink-600">
              {p.kind} · {p.topic?.name} · by {p.author.displayName}
              {p.status === 'approved' ? ' · edit of a published post' : ''}
            </p>
            <Link to={postHref(p.id)} className="text-lg font-bold underline">
              {p.title}
            </Link>
            <p className="text-sm text-ink-700">{p.excerpt}</p>
          </DeskCard>
        ))}
      </DeskSection>
      <DeskSection
        id="q-comments"
        heading={`Comments waiting (${queue.comments.length})`}
        count={comments.length}
      >
        {comments.map((c) => (
          <DeskCard
            key={commentKey(c)}
            desk={desk}
            itemKey={commentKey(c)}
            title={c.postTitle}
            actions={[
              {
                label: 'Publish',
                ariaLabel: `Publish the comment by ${c.author.displayName}`,
                showsPending: true,
                onClick: (e) => void decideComment(c, 'publish', e),
              },
              {
                label: 'Decline…',
                ariaLabel: `Decline the comment by ${c.author.displayName}`,
                variant: 'refuse',
                onClick: (e) => void decideComment(c, 'decline', e),
              },
            ]}
          >
            <p className="text-xs text-ink-600">
              {c.author.displayName} on{' '}
              <Link to={postHref(c.postId)} className="underline">
                {c.postTitle}
              </Link>
            </p>
            <p className="whitespace-pre-line">{c.body}</p>
          </DeskCard>
        ))}
      </DeskSection>
      <DeskSection
        id="q-reports"
        heading={`Reports (${queue.reports.length})`}
        count={reports.length}
        emptyText="No open reports."
      >
        {reports.map((r) => (
          <DeskCard
            key={reportKey(r)}
            desk={desk}
            itemKey={reportKey(r)}
            title={r.targetTitle}
            tone="report"
            actions={[
              {
                label: 'Dismiss',
                variant: 'secondary',
                onClick: (e) => void resolve(r, 'dismiss', e),
              },
              {
                label: `Hide the ${r.targetType}`,
                variant: 'refuse',
                onClick: (e) => void resolve(r, 'hide-target', e),
              },
            ]}
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
          </DeskCard>
        ))}
      </DeskSection>
      {children}
      {dialog}
    </div>
  );
}
