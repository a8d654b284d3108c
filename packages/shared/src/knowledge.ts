import { z } from 'zod';
import { BOTTOMS, HULLS, planComponentsSchema } from './boats';
import { numberField } from './fields';
import { nonEmptyPatchOf } from './patch';
import { tiptapDocSchema } from './post-body';

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

/** A tackle setup carried by a post: the boat, the conditions and the gear (SI units). */
export const postSetupSchema = z.object({
  boat: z.object({
    label: z.string().trim().max(80).default(''),
    hull: z.enum(HULLS, { error: 'Choose sail, power or multihull' }),
    loaM: numberField('Length overall', 2, 60, 'm'),
    beamM: numberField('Beam', 0.5, 20, 'm').optional(),
    displacementKg: numberField('Displacement', 50, 500000, 'kg').optional(),
    bowHeightM: numberField('Bow-roller height', 0, 8, 'm').default(1),
  }),
  windKn: numberField('Design wind', 5, 100, 'kn'),
  depthM: numberField('Depth', 0.5, 100, 'm'),
  tideM: numberField('Tidal rise', 0, 15, 'm').default(0),
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
