import { formatDate } from '@app/shared/locale';
import { Link, useParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { usePost } from '@/features/knowledge/api/get-post';
import { useHelpfulVote } from '@/features/knowledge/api/post-actions';
import { CommentThread, ReportButton } from '@/features/knowledge/components/comment-thread';
import { POST_BODY_CLASSES } from '@/features/knowledge/components/post-body-classes';
import { PostStatusBadge } from '@/features/knowledge/components/post-status-badge';
import { SetupCard } from '@/features/knowledge/components/setup-card';
import { PostModerationBar } from '@/features/moderation/components/post-moderation-bar';
import { errorMessage } from '@/lib/form-errors';

/** One post: body (sanitized on the server), setup card, votes, comments, and moderator tools. */
export function PostRoute() {
  const postId = Number(useParams().postId);
  const { user } = useCurrentUser();
  const post = usePost(postId);
  const vote = useHelpfulVote(postId);
  if (post.isPending) return <Spinner label="Loading the post…" />;
  if (post.isError)
    return (
      <Alert tone="error" title="Couldn't open this post">
        <p>{errorMessage(post.error)}</p>
      </Alert>
    );
  const p = post.data;
  return (
    <Page title={p.title}>
      <p className="-mt-4 flex flex-wrap items-center gap-2 text-sm text-ink-700">
        <span>{p.kind === 'question' ? 'Question' : 'Article'}</span>
        {p.topic && (
          <Link to={`${paths.knowledge.href()}?topic=${p.topic.slug}`} className="underline">
            {p.topic.name}
          </Link>
        )}
        <span>by {p.author.displayName}</span>
        {p.publishedAt && <span>· {formatDate(p.publishedAt)}</span>}
        {p.visibility === 'members' && <span>· members only</span>}
        {p.status !== 'approved' && <PostStatusBadge status={p.status} />}
      </p>
      {p.moderationNote && (
        <Alert tone="warning" title="From the moderators">
          <p>{p.moderationNote}</p>
        </Alert>
      )}
      {p.revision && (
        <Alert
          tone={p.revision.status === 'pending' ? 'info' : 'warning'}
          title={
            p.revision.status === 'pending'
              ? 'An edit of this post waits for a moderator'
              : 'An edit of this post was sent back'
          }
        >
          <p>
            Readers see the published version below until the edit “{p.revision.title}” is approved.
          </p>
        </Alert>
      )}
      {p.viewer.canModerate && <PostModerationBar post={p} />}
      {p.boat && (
        <p className="text-sm text-ink-700">
          Boat: {p.boat.name} ({p.boat.hull}, {p.boat.loaM} m)
        </p>
      )}
      {/* bodyHtml is rendered from allowed Tiptap nodes and sanitized with sanitize-html on the server */}
      <article
        className={`max-w-prose ${POST_BODY_CLASSES}`}
        dangerouslySetInnerHTML={{ __html: p.bodyHtml }}
      />
      {p.setupCard && <SetupCard card={p.setupCard} units={user?.unitSystem ?? 'metric'} />}
      {p.revision && p.viewer.canModerate && (
        <section aria-labelledby="revision-heading" className="border-l-4 border-ink-300 pl-4">
          <h2 id="revision-heading" className="text-lg font-bold">
            The edit waiting for review: {p.revision.title}
          </h2>
          <p className="text-sm text-ink-600">
            {p.revision.visibility === 'members' ? 'Members only' : 'Public'}
            {p.revision.setup ? ' · with a setup block' : ''}
          </p>
          {/* sanitized on the server like bodyHtml above */}
          <div
            className={`max-w-prose ${POST_BODY_CLASSES}`}
            dangerouslySetInnerHTML={{ __html: p.revision.bodyHtml }}
          />
        </section>
      )}
      <div className="flex flex-wrap items-center gap-3">
        {user && user.id !== p.author.id && p.status === 'approved' && (
          <Button
            variant="secondary"
            aria-pressed={p.viewer.hasVoted}
            isPending={vote.isPending}
            onClick={() => vote.mutate(!p.viewer.hasVoted)}
          >
            {p.viewer.hasVoted ? 'You found this helpful' : 'Helpful'}
          </Button>
        )}
        <span className="text-sm text-ink-700">{p.helpfulCount} found it helpful</span>
        {p.viewer.canEdit && (
          <Link to={paths.postEdit.href(p.id)} className="underline">
            Edit
          </Link>
        )}
        {user && <ReportButton targetType="post" targetId={p.id} />}
      </div>
      <CommentThread post={p} signedIn={!!user} />
    </Page>
  );
}
