import type { z } from 'zod';
import type { reportInputSchema, resolveReportSchema } from '@app/shared';
import { AppError, notFound } from '../../errors/app-error';
import { Comment, Post, Report, type User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { notify } from '../posts/notifications.service';
import { loadVisiblePost } from '../posts/post-access';
import { canSeeComment } from '../../policies/posts';
import { indexPost } from '../posts/post-index';
import { DecisionRecord } from '../audit/decision-record';

type ReportInput = z.output<typeof reportInputSchema>;
type Resolve = z.output<typeof resolveReportSchema>;

/** The post a report is about (for a comment, its post), or null when it is gone. */
export async function reportTarget(r: Pick<Report, 'targetType' | 'targetId'>) {
  if (r.targetType === 'post') {
    const post = await Post.findByPk(r.targetId);
    return { post, comment: null };
  }
  const comment = await Comment.findByPk(r.targetId);
  const post = comment ? await Post.findByPk(comment.postId) : null;
  return { post, comment };
}

/**
 * Files a member's report on a post or comment they can see; it lands in the moderators' queue. A second
 * open report by the same member on the same thing is refused with CONFLICT.
 */
export async function createReport(actor: User, input: ReportInput) {
  if (input.targetType === 'post') await loadVisiblePost(actor, input.targetId);
  else {
    const comment = await Comment.findByPk(input.targetId);
    if (!comment || !canSeeComment(actor, comment)) throw notFound('Comment');
    await loadVisiblePost(actor, comment.postId);
  }
  const dup = await Report.count({
    where: {
      reporterId: actor.id,
      targetType: input.targetType,
      targetId: input.targetId,
      status: 'open',
    },
  });
  if (dup > 0)
    throw new AppError('CONFLICT', 'You have already reported this; a moderator will look at it');
  return Report.create({
    reporterId: actor.id,
    targetType: input.targetType,
    targetId: input.targetId,
    reason: input.reason,
    resolution: null,
    resolvedById: null,
  });
}

/**
 * Resolves an open report: dismiss it, or hide the post or comment it is about. Every open report on the same
 * thing is closed with it; the reporters are told in the app; the action is logged and can be undone for a
 * while (`undoDecision`).
 */
export async function resolveReport(actor: User, reportId: number, input: Resolve) {
  const report = await Report.findByPk(reportId);
  if (!report) throw notFound('Report');
  if (report.status !== 'open') throw new AppError('CONFLICT', 'This report is already resolved');
  const { post, comment } = await reportTarget(report);
  const hide = input.outcome === 'hide-target';
  const action = hide ? `report.hide-${report.targetType}` : 'report.dismiss';
  const sequelize = Report.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  const decision = await sequelize.transaction(async (t) => {
    const rec = new DecisionRecord(t);
    if (hide && comment)
      await rec.update('comment', comment, {
        status: 'hidden',
        moderationNote: input.note || report.reason,
      });
    else if (hide && post)
      await rec.update('post', post, {
        status: 'hidden',
        moderationNote: input.note || report.reason,
      });
    const same = await Report.findAll({
      where: { targetType: report.targetType, targetId: report.targetId, status: 'open' },
      transaction: t,
    });
    const path = post ? `/knowledge/${post.id}` : null;
    for (const r of same) {
      await rec.update('report', r, {
        status: hide ? 'actioned' : 'dismissed',
        resolution: input.note || null,
        resolvedById: actor.id,
      });
      const n = await notify(
        r.reporterId,
        'report',
        hide
          ? 'Thanks: a moderator acted on your report'
          : 'A moderator looked at your report and left it as it is',
        path,
        t,
      );
      rec.told({ userId: r.reporterId, notificationId: n.id });
    }
    await recordAudit(
      {
        actorId: actor.id,
        area: 'moderation',
        action,
        subjectType: 'report',
        subjectId: String(report.id),
        reason: input.note || null,
        details: { targetType: report.targetType, targetId: report.targetId },
      },
      t,
    );
    return rec.save(actor, {
      area: 'moderation',
      action,
      subjectType: 'report',
      subjectId: report.id,
      title: post?.title ?? '',
      path,
    });
  });
  if (post) await indexPost(post.id);
  return { row: await report.reload(), decision };
}
