import { z } from 'zod';
import { POST_DECISIONS, REPORT_TARGETS, type PostDecision } from './values/moderation';

export * from './values/moderation';
import type { CommentDto, PostAuthorDto, PostSummaryDto } from './knowledge-dtos';

// Moderators' decisions on posts and comments, their undo, post flags and members' reports.

const reason = z.string().trim().max(1000, 'Keep the reason under 1,000 characters');

const LEGACY_DECISION: Record<string, PostDecision> = {
  approve: 'publish',
  'request-changes': 'send-back',
  reject: 'decline',
};
export const decisionSchema = z
  .object({
    action: z
      .enum([...POST_DECISIONS, 'approve', 'request-changes', 'reject'], {
        error: 'Choose publish, send-back or decline',
      })
      .transform((a): PostDecision => LEGACY_DECISION[a] ?? (a as PostDecision)),
    reason: reason.default(''),
  })
  .refine((d) => d.action === 'publish' || d.reason.length >= 3, {
    message: 'Say why, so the author knows what to change',
    path: ['reason'],
  });
export type DecisionInput = z.input<typeof decisionSchema>;

export const commentDecisionSchema = z
  .object({
    action: z
      .enum(['publish', 'decline', 'approve', 'reject'], { error: 'Choose publish or decline' })
      .transform((a) => (a === 'approve' ? 'publish' : a === 'reject' ? 'decline' : a)),
    reason: reason.default(''),
  })
  .refine((d) => d.action === 'publish' || d.reason.length >= 3, {
    message: 'Say why, so the author knows',
    path: ['reason'],
  });
export type CommentDecisionInput = z.input<typeof commentDecisionSchema>;

/** What a decision answers: the decision's id, for Undo. */
export interface DecisionResultDto {
  id: number;
  status: string;
  decisionId: number;
}

/** What an undo answers. */
export interface UndoResultDto {
  id: number;
  subjectType: string;
  subjectId: number;
  undoneAt: string;
}

export const postFlagsSchema = z
  .object({
    pinned: z.boolean().optional(),
    locked: z.boolean().optional(),
    hidden: z.boolean().optional(),
    reason: reason.default(''),
  })
  .refine((f) => f.pinned !== undefined || f.locked !== undefined || f.hidden !== undefined, {
    message: 'Nothing to change',
  })
  .refine((f) => f.hidden !== true || f.reason.length >= 3, {
    message: 'Say why the post is hidden',
    path: ['reason'],
  });
export type PostFlagsInput = z.input<typeof postFlagsSchema>;

export const reportInputSchema = z.object({
  targetType: z.enum(REPORT_TARGETS),
  targetId: z.number().int().positive(),
  reason: z
    .string({ error: 'Say what is wrong' })
    .trim()
    .min(3, 'Say what is wrong')
    .max(1000, 'Keep it under 1,000 characters'),
});
export type ReportInput = z.input<typeof reportInputSchema>;

export const resolveReportSchema = z.object({
  outcome: z.enum(['dismiss', 'hide-target']),
  note: reason.default(''),
});
export type ResolveReportInput = z.input<typeof resolveReportSchema>;

export interface QueueCommentDto extends CommentDto {
  postTitle: string;
}
export interface ReportDto {
  id: number;
  targetType: (typeof REPORT_TARGETS)[number];
  targetId: number;
  postId: number | null;
  targetTitle: string;
  targetExcerpt: string;
  reason: string;
  reporter: PostAuthorDto;
  status: 'open' | 'dismissed' | 'actioned';
  resolution: string | null;
  createdAt: string;
}
export interface ModerationQueueDto {
  posts: PostSummaryDto[];
  comments: QueueCommentDto[];
  reports: ReportDto[];
}
export interface ModerationCountDto {
  pendingPosts: number;
  pendingComments: number;
  openReports: number;
  /** Open reports on exchange listings. */
  openListingReports: number;
  total: number;
}
export interface AuditEntryDto {
  id: number;
  actor: PostAuthorDto | null;
  action: string;
  subjectType: string;
  subjectId: string | null;
  reason: string | null;
  details: unknown;
  createdAt: string;
}
