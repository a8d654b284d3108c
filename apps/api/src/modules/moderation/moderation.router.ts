import { Router } from 'express';
import { z } from 'zod';
import {
  commentDecisionSchema,
  decisionSchema,
  excerptOf,
  idParam,
  postFlagsSchema,
  reportInputSchema,
  resolveReportSchema,
  type UndoResultDto,
} from '@app/shared';
import { currentUser, requireAuth, requireRole } from '../../middleware/require-auth';
import { approvedCommentCounts } from '../posts/post-access';
import { toCommentDto, toPostSummaryDto } from '../posts/posts.presenter';
import { toAuditEntryDto, toQueueCommentDto, toReportDto } from './moderation.presenter';
import { undoDecision } from './decisions.service';
import { decideComment } from './comment-decisions.service';
import * as mod from './moderation.service';
import { decidePost } from './post-decisions.service';
import { setFlags } from './post-flags.service';
import { createReport, resolveReport } from './reports.service';
import { ROLES_MODERATOR, ROLES_MODERATOR_OR_ADMIN } from '../../policies/roles';

const pageQuery = z.object({ page: z.coerce.number().int().min(1).max(1000).default(1) });
const id = (name: string, p: unknown) => Number(idParam(name).parse(p)[name]);

/** The moderators' desk: queue, decisions, flags, reports and the log. Moderators only. */
export function moderationRouter(ctx: mod.ModContext) {
  const r = Router();
  // Undo is also open to admins (who may undo any moderator's decision); the rest is moderators only.
  r.post(
    '/decisions/:decisionId/undo',
    requireRole(...ROLES_MODERATOR_OR_ADMIN),
    async (req, res) => {
      const d = await undoDecision(ctx, currentUser(req), id('decisionId', req.params));
      const data: UndoResultDto = {
        id: d.id,
        subjectType: d.subjectType,
        subjectId: d.subjectId,
        undoneAt: (d.undoneAt ?? new Date()).toISOString(),
      };
      res.json({ data });
    },
  );
  r.use(requireRole(...ROLES_MODERATOR));
  r.get('/queue', async (_req, res) => {
    const q = await mod.queue();
    const counts = await approvedCommentCounts(q.posts.map((p) => p.id));
    res.json({
      data: {
        posts: q.posts.map((p) => {
          const summary = toPostSummaryDto(p, counts.get(p.id) ?? 0);
          if (p.status !== 'approved' || !p.revision) return summary;
          // An edit of a published post: the queue shows the edit, marked as such.
          return {
            ...summary,
            title: p.revision.title,
            excerpt: excerptOf(p.revision.bodyText),
            editOfPublished: true,
          };
        }),
        comments: q.comments.map(toQueueCommentDto),
        reports: await Promise.all(q.reports.map(toReportDto)),
      },
    });
  });
  r.get('/count', async (_req, res) => {
    res.json({ data: await mod.counts() });
  });
  r.post('/posts/:postId/decision', async (req, res) => {
    const { row, decision } = await decidePost(
      ctx,
      currentUser(req),
      id('postId', req.params),
      decisionSchema.parse(req.body),
    );
    res.json({ data: { id: row.id, status: row.status, decisionId: decision.id } });
  });
  r.patch('/posts/:postId/flags', async (req, res) => {
    const post = await setFlags(
      ctx,
      currentUser(req),
      id('postId', req.params),
      postFlagsSchema.parse(req.body),
    );
    res.json({
      data: {
        id: post.id,
        status: post.status,
        pinned: post.pinnedAt !== null,
        locked: post.lockedAt !== null,
      },
    });
  });
  r.post('/comments/:commentId/decision', async (req, res) => {
    const { row, decision } = await decideComment(
      ctx,
      currentUser(req),
      id('commentId', req.params),
      commentDecisionSchema.parse(req.body),
    );
    res.json({ data: { ...toCommentDto(row, null), decisionId: decision.id } });
  });
  r.post('/reports/:reportId/resolve', async (req, res) => {
    const { row, decision } = await resolveReport(
      currentUser(req),
      id('reportId', req.params),
      resolveReportSchema.parse(req.body),
    );
    res.json({ data: { id: row.id, status: row.status, decisionId: decision.id } });
  });
  r.get('/log', async (req, res) => {
    const { page } = pageQuery.parse(req.query);
    const { rows, total } = await mod.auditLog(page);
    res.json({ data: rows.map(toAuditEntryDto), meta: { page, pageSize: 50, total } });
  });
  return r;
}

/** Members report posts and comments here; reports land in the moderators' queue. */
export function reportsRouter() {
  const r = Router();
  r.post('/', requireAuth(), async (req, res) => {
    const rep = await createReport(currentUser(req), reportInputSchema.parse(req.body));
    res.status(201).json({ data: { id: rep.id, status: rep.status } });
  });
  return r;
}
