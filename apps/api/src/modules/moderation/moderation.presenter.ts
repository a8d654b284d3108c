import { excerptOf, type AuditEntryDto, type QueueCommentDto, type ReportDto } from '@app/shared';
import type { AuditEvent, Comment, Report, User } from '../../models';
import { toCommentDto } from '../posts/posts.presenter';
import { reportTarget } from './reports.service';

/** A pending comment with the title of its post. */
export const toQueueCommentDto = (c: Comment): QueueCommentDto => ({
  ...toCommentDto(c, null),
  postTitle: c.post?.title ?? '',
});

/** A report with a short view of what it is about. */
export async function toReportDto(r: Report): Promise<ReportDto> {
  const { post, comment } = await reportTarget(r);
  return {
    id: r.id,
    targetType: r.targetType,
    targetId: r.targetId,
    postId: post?.id ?? null,
    targetTitle: post?.title ?? '(deleted)',
    targetExcerpt: excerptOf(comment?.body ?? post?.bodyText ?? '', 240),
    reason: r.reason,
    reporter: { id: r.reporterId, displayName: r.reporter?.displayName ?? 'A member' },
    status: r.status,
    resolution: r.resolution,
    createdAt: r.createdAt.toISOString(),
  };
}

/** One row of the moderation log: who, what, when, why. */
export function toAuditEntryDto(e: AuditEvent & { actor?: User | null }): AuditEntryDto {
  return {
    id: e.id,
    actor: e.actor ? { id: e.actor.id, displayName: e.actor.displayName } : null,
    action: e.action,
    subjectType: e.subjectType,
    subjectId: e.subjectId,
    reason: e.reason,
    details: e.details,
    createdAt: e.createdAt.toISOString(),
  };
}
