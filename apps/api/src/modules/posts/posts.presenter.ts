import { excerptOf, type CommentDto, type NotificationDto, type PostSummaryDto } from '@app/shared';
import type { Comment, Notification, Post } from '../../models';

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** A post as it appears in lists. */
export function toPostSummaryDto(p: Post, commentCount: number): PostSummaryDto {
  return {
    id: p.id,
    kind: p.kind,
    title: p.title,
    excerpt: excerptOf(p.bodyText),
    status: p.status,
    visibility: p.visibility,
    topic: p.topic ? { id: p.topic.id, slug: p.topic.slug, name: p.topic.name } : null,
    author: { id: p.authorId, displayName: p.author?.displayName ?? 'A member' },
    hasSetup: p.setup !== null,
    helpfulCount: p.helpfulCount,
    commentCount,
    answered: p.acceptedCommentId !== null,
    pinned: p.pinnedAt !== null,
    locked: p.lockedAt !== null,
    publishedAt: iso(p.publishedAt),
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** A comment (replies filled in by the caller). */
export function toCommentDto(c: Comment, acceptedId: number | null): CommentDto {
  return {
    id: c.id,
    postId: c.postId,
    parentId: c.parentId,
    author: { id: c.authorId, displayName: c.author?.displayName ?? 'A member' },
    body: c.body,
    status: c.status,
    accepted: c.id === acceptedId,
    createdAt: c.createdAt.toISOString(),
    replies: [],
  };
}

export function toNotificationDto(n: Notification): NotificationDto {
  return {
    id: n.id,
    kind: n.kind,
    message: n.message,
    link: n.link,
    readAt: iso(n.readAt),
    createdAt: n.createdAt.toISOString(),
  };
}
