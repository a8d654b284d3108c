import { z } from 'zod';
import { BOTTOMS, HULLS, planComponentsSchema } from './boats';
import { nonEmptyPatchOf } from './patch';

export const POST_KINDS = ['article', 'question'] as const;
export type PostKind = (typeof POST_KINDS)[number];
export const POST_STATUSES = [
  'draft',
  'pending',
  'changes-requested',
  'approved',
  'rejected',
  'hidden',
] as const;
export type PostStatus = (typeof POST_STATUSES)[number];
export const POST_VISIBILITIES = ['public', 'members'] as const;
export type PostVisibility = (typeof POST_VISIBILITIES)[number];
export const COMMENT_STATUSES = ['pending', 'approved', 'rejected', 'hidden'] as const;
export type CommentStatus = (typeof COMMENT_STATUSES)[number];

/** Largest post body, in characters of plain text, and of its stored JSON. */
export const MAX_POST_TEXT_CHARS = 40_000;
export const MAX_POST_JSON_CHARS = 150_000;

/** Node types a post body may hold, with the attributes each may carry. */
export const ALLOWED_NODES: Readonly<Record<string, readonly string[]>> = {
  doc: [],
  paragraph: [],
  text: [],
  heading: ['level'],
  bulletList: [],
  orderedList: ['start', 'type'],
  listItem: [],
  blockquote: [],
  codeBlock: ['language'],
  hardBreak: [],
  horizontalRule: [],
  image: ['src', 'alt', 'title', 'width', 'height'],
};
/** Mark types a post body may hold, with their attributes. */
export const ALLOWED_MARKS: Readonly<Record<string, readonly string[]>> = {
  bold: [],
  italic: [],
  strike: [],
  underline: [],
  code: [],
  link: ['href', 'target', 'rel', 'class', 'title'],
};

/** One node of Tiptap (ProseMirror) JSON. */
export interface TiptapNode {
  type: string;
  attrs?: Record<string, unknown>;
  content?: TiptapNode[];
  marks?: Array<{ type: string; attrs?: Record<string, unknown> }>;
  text?: string;
}

const MAX_DEPTH = 12;

/**
 * Walks a Tiptap document and returns the first problem (unknown node or mark type, unknown attribute,
 * too deep), or null when every part is one we allow.
 */
export function tiptapProblem(doc: unknown): string | null {
  const walk = (node: unknown, depth: number): string | null => {
    if (depth > MAX_DEPTH) return 'The post is nested too deeply';
    if (typeof node !== 'object' || node === null || Array.isArray(node))
      return 'The post body is not a document';
    const n = node as Record<string, unknown>;
    const type = n.type;
    if (typeof type !== 'string') return 'Every part of the post needs a type';
    const attrsAllowed = ALLOWED_NODES[type];
    if (!Object.hasOwn(ALLOWED_NODES, type) || !attrsAllowed)
      return `Unknown node type "${type.slice(0, 40)}"`;
    if (depth === 0 && type !== 'doc') return 'The post body must be a document';
    for (const key of Object.keys(n))
      if (!['type', 'attrs', 'content', 'marks', 'text'].includes(key))
        return `Unknown key "${key.slice(0, 40)}" in ${type}`;
    const attrProblem = checkAttrs(n.attrs, attrsAllowed, type);
    if (attrProblem) return attrProblem;
    if (n.text !== undefined && (type !== 'text' || typeof n.text !== 'string'))
      return 'Text must be a string inside a text node';
    if (n.marks !== undefined) {
      if (!Array.isArray(n.marks)) return 'Marks must be a list';
      for (const mark of n.marks as unknown[]) {
        const m = (typeof mark === 'object' && mark !== null ? mark : {}) as Record<
          string,
          unknown
        >;
        const markType = typeof m.type === 'string' ? m.type : '';
        const markAttrs = ALLOWED_MARKS[markType];
        if (!Object.hasOwn(ALLOWED_MARKS, markType) || !markAttrs)
          return `Unknown mark type "${markType.slice(0, 40)}"`;
        const p = checkAttrs(m.attrs, markAttrs, markType);
        if (p) return p;
      }
    }
    if (n.content !== undefined) {
      if (!Array.isArray(n.content)) return 'Content must be a list';
      for (const child of n.content as unknown[]) {
        const p = walk(child, depth + 1);
        if (p) return p;
      }
    }
    return null;
  };
  return walk(doc, 0);
}

function checkAttrs(attrs: unknown, allowed: readonly string[], type: string): string | null {
  if (attrs === undefined || attrs === null) return null;
  if (typeof attrs !== 'object' || Array.isArray(attrs)) return `Bad attributes on ${type}`;
  for (const [key, value] of Object.entries(attrs)) {
    if (!allowed.includes(key)) return `Unknown attribute "${key.slice(0, 40)}" on ${type}`;
    if (value !== null && !['string', 'number', 'boolean'].includes(typeof value))
      return `Bad value for ${key} on ${type}`;
  }
  return null;
}

/** A Tiptap document made only of the nodes and marks we allow, under the size cap. */
export const tiptapDocSchema = z.unknown().superRefine((doc, ctx) => {
  const problem = tiptapProblem(doc);
  if (problem) {
    ctx.addIssue({ code: 'custom', message: problem });
    return;
  }
  if (JSON.stringify(doc).length > MAX_POST_JSON_CHARS)
    ctx.addIssue({
      code: 'custom',
      message: `The post is too long: keep it under about ${MAX_POST_TEXT_CHARS.toLocaleString('en')} characters`,
    });
});

const num = (label: string, min: number, max: number, unit: string) =>
  z
    .number({ error: `${label} must be a number` })
    .finite(`${label} must be a number`)
    .min(min, `${label} must be at least ${min} ${unit}`)
    .max(max, `${label} must be at most ${max} ${unit}`);

/** A tackle setup carried by a post: the boat, the conditions and the gear (SI units). */
export const postSetupSchema = z.object({
  boat: z.object({
    label: z.string().trim().max(80).default(''),
    hull: z.enum(HULLS, { error: 'Choose sail, power or multihull' }),
    loaM: num('Length overall', 2, 60, 'm'),
    beamM: num('Beam', 0.5, 20, 'm').optional(),
    displacementKg: num('Displacement', 50, 500000, 'kg').optional(),
    bowHeightM: num('Bow-roller height', 0, 8, 'm').default(1),
  }),
  windKn: num('Design wind', 5, 100, 'kn'),
  depthM: num('Depth', 0.5, 100, 'm'),
  tideM: num('Tidal rise', 0, 15, 'm').default(0),
  bottom: z.enum(BOTTOMS).optional(),
  components: planComponentsSchema,
});
export type PostSetupInput = z.input<typeof postSetupSchema>;
export type PostSetup = z.output<typeof postSetupSchema>;

const title = z
  .string({ error: 'Title is required' })
  .trim()
  .min(3, 'Give the post a title of at least 3 characters')
  .max(160, 'Keep the title under 160 characters');

export const postInputSchema = z.object({
  kind: z.enum(POST_KINDS, { error: 'Choose article or question' }),
  title,
  topicId: z.number({ error: 'Choose a topic' }).int().positive('Choose a topic'),
  body: tiptapDocSchema,
  visibility: z.enum(POST_VISIBILITIES).default('public'),
  boatId: z.number().int().positive().nullable().optional(),
  setup: postSetupSchema.nullable().optional(),
});
export type PostInput = z.input<typeof postInputSchema>;

/** Creating a post: a draft unless `submit` is true (then it goes to moderation). */
export const createPostSchema = postInputSchema.extend({ submit: z.boolean().default(false) });
export type CreatePostInput = z.input<typeof createPostSchema>;
/** A change to a post: only the fields sent change (visibility stays unless sent). */
export const postPatchSchema = nonEmptyPatchOf(postInputSchema);
export type PostPatchInput = z.input<typeof postPatchSchema>;

export const postListQuerySchema = z.object({
  topic: z.string().trim().max(60).optional(),
  kind: z.enum(POST_KINDS).optional(),
  page: z.coerce.number().int().min(1).max(1000).default(1),
});

export const searchQuerySchema = z.object({
  q: z.string().trim().min(1, 'Type something to search for').max(200, 'The search is too long'),
  topic: z.string().trim().max(60).optional(),
});

export const commentInputSchema = z.object({
  body: z
    .string({ error: 'Write something first' })
    .trim()
    .min(1, 'Write something first')
    .max(5000, 'Keep a comment under 5,000 characters'),
  parentId: z.number().int().positive().nullable().optional(),
});
export type CommentInput = z.input<typeof commentInputSchema>;

export const acceptAnswerSchema = z.object({
  commentId: z.number().int().positive().nullable(),
});

const reason = z.string().trim().max(1000, 'Keep the reason under 1,000 characters');

/**
 * A moderator's decision on a waiting post: publish it, send it back to the author with a note, or decline it
 * with a reason. The older action names (approve, request-changes, reject) are still accepted and mean the same.
 */
export const POST_DECISIONS = ['publish', 'send-back', 'decline'] as const;
export type PostDecision = (typeof POST_DECISIONS)[number];
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

/** How long a moderator's decision can be undone (`POST /api/moderation/decisions/:id/undo`). */
export const UNDO_WINDOW_MS = 10 * 60 * 1000;

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

export const REPORT_TARGETS = ['post', 'comment'] as const;
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

export const topicInputSchema = z.object({
  name: z.string().trim().min(2, 'Name the topic').max(60, 'Keep the name under 60 characters'),
  description: z.string().trim().max(300).default(''),
  position: z.number().int().min(0).max(1000).default(100),
});
export type TopicInput = z.input<typeof topicInputSchema>;
// No defaults here: a rename must not reset the description or the position.
export const topicPatchSchema = z
  .object({
    name: topicInputSchema.shape.name,
    description: z.string().trim().max(300, 'Keep the description under 300 characters'),
    position: z.number().int().min(0).max(1000),
    /** true retires the topic (no new posts under it), false brings it back. */
    retired: z.boolean(),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type TopicPatchInput = z.input<typeof topicPatchSchema>;
/** The whole list in its new order: every topic id exactly once. */
export const topicOrderSchema = z.object({
  topicIds: z
    .array(z.number().int().positive())
    .min(1, 'List the topics in their new order')
    .max(200)
    .refine((ids) => new Set(ids).size === ids.length, 'Each topic once'),
});
export type TopicOrderInput = z.input<typeof topicOrderSchema>;

export interface TopicDto {
  id: number;
  slug: string;
  name: string;
  description: string;
  position: number;
  /** Retired topics keep their posts but are not offered for new ones. */
  retired: boolean;
  postCount: number;
}

export interface PostAuthorDto {
  id: number;
  displayName: string;
}

export interface PostSummaryDto {
  id: number;
  kind: PostKind;
  title: string;
  excerpt: string;
  status: PostStatus;
  visibility: PostVisibility;
  topic: {
    id: number;
    slug: string;
    name: string; /** In the moderation queue: this entry is an edit of a published post (readers still see the published one). */
    editOfPublished?: boolean;
  } | null;
  author: PostAuthorDto;
  hasSetup: boolean;
  helpfulCount: number;
  commentCount: number;
  answered: boolean;
  pinned: boolean;
  locked: boolean;
  publishedAt: string | null;
  updatedAt: string;
}

/** The figures computed for a post's setup by @app/calc. */
export interface SetupCardDto {
  setup: PostSetup;
  loadN: number;
  heightM: number;
  rodeLengthM: number;
  scopeRatio: number | null;
  scopeLabel: string | null;
  weakest: { label: string; marginOnWll: number; breakFactor: number } | null;
  withinWll: boolean | null;
  catenary: {
    suspendedM: number;
    onBottomM: number;
    bowAngleDeg: number;
    anchorAngleDeg: number;
    liftsAtAnchor: boolean;
  } | null;
  /** The setup's anchor against the holding model at the design wind (null without an anchor). */
  anchor: {
    massKg: number;
    neededKg: number | null;
    meetsMinimum: boolean;
    meetsSuggested: boolean;
  } | null;
  /** What Rodewise recommends for the same boat and wind, the same function as the boat page. */
  recommendation: {
    anchorType: string;
    anchorKg: number | null;
    chain: string | null;
    nylon: string | null;
    snubber: string;
  } | null;
  warnings: string[];
  cautions: string[];
  basis: string;
}

export interface CommentDto {
  id: number;
  postId: number;
  parentId: number | null;
  author: PostAuthorDto;
  body: string;
  status: CommentStatus;
  accepted: boolean;
  createdAt: string;
  replies: CommentDto[];
}

/** Where an edit of a published post stands: waiting, sent back with a note, or turned down. */
export type RevisionStatus = 'pending' | 'changes-requested' | 'rejected';

/** An edit of a published post that waits for a moderator (shown to its author and moderators only). */
export interface PostRevisionDto {
  status: RevisionStatus;
  kind: PostKind;
  title: string;
  topicId: number | null;
  boatId: number | null;
  visibility: PostVisibility;
  body: unknown;
  bodyHtml: string;
  setup: PostSetup | null;
}

export interface PostDetailDto extends PostSummaryDto {
  body: unknown;
  bodyHtml: string;
  /** The author's edit waiting for a moderator; the fields above stay what readers see until it is approved. */
  revision: PostRevisionDto | null;
  moderationNote: string | null;
  boat: { id: number; name: string; hull: string; loaM: number } | null;
  setupCard: SetupCardDto | null;
  acceptedCommentId: number | null;
  comments: CommentDto[];
  viewer: {
    canEdit: boolean;
    canModerate: boolean;
    canAccept: boolean;
    hasVoted: boolean;
    canComment: boolean;
  };
}

/** One piece of highlighted text: `match` pieces are the words that matched the search. */
export interface HighlightPiece {
  text: string;
  match: boolean;
}
export interface SearchHitDto {
  post: PostSummaryDto;
  score: number;
  title: HighlightPiece[];
  snippet: HighlightPiece[];
  terms: string[];
}

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
export interface NotificationDto {
  id: number;
  kind: string;
  message: string;
  link: string | null;
  readAt: string | null;
  createdAt: string;
}
