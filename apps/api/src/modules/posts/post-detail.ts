import type { PostDetailDto } from '@app/shared';
import { Boat, type Post, type User } from '../../models';
import { commentThread } from './comments.service';
import { hasModeratorRole } from '../../policies/roles';
import { toPostSummaryDto } from './posts.presenter';
import { hasVoted } from './posts.service';
import { computeSetupCard } from './setup-card';

/** Everything the post page shows, for this viewer. */
export async function toPostDetailDto(post: Post, viewer: User | null): Promise<PostDetailDto> {
  const [comments, voted, boat] = await Promise.all([
    commentThread(viewer, post),
    hasVoted(viewer, post.id),
    post.boatId ? Boat.findByPk(post.boatId) : Promise.resolve(null),
  ]);
  const approvedCount = comments.reduce(
    (n, c) =>
      n +
      (c.status === 'approved' ? 1 : 0) +
      c.replies.filter((r) => r.status === 'approved').length,
    0,
  );
  const mod = hasModeratorRole(viewer);
  const isAuthor = viewer?.id === post.authorId;
  let setupCard = null;
  if (post.setup) {
    try {
      setupCard = computeSetupCard(post.setup);
    } catch {
      setupCard = null; // a setup the tables no longer accept is shown without figures
    }
  }
  return {
    ...toPostSummaryDto(post, approvedCount),
    body: post.bodyJson,
    bodyHtml: post.bodyHtml,
    revision:
      (isAuthor || mod) && post.revision && post.revisionStatus
        ? {
            status: post.revisionStatus,
            kind: post.revision.kind,
            title: post.revision.title,
            topicId: post.revision.topicId,
            boatId: post.revision.boatId,
            visibility: post.revision.visibility,
            body: post.revision.bodyJson,
            bodyHtml: post.revision.bodyHtml,
            setup: post.revision.setup,
          }
        : null,
    moderationNote: isAuthor || mod ? post.moderationNote : null,
    boat: boat ? { id: boat.id, name: boat.name, hull: boat.hull, loaM: boat.loaM } : null,
    setupCard,
    acceptedCommentId: post.acceptedCommentId,
    comments,
    viewer: {
      canEdit: isAuthor,
      canModerate: mod,
      canAccept: post.kind === 'question' && (isAuthor || mod),
      hasVoted: voted,
      canComment: viewer !== null && post.status === 'approved' && post.lockedAt === null,
    },
  };
}
