import { z } from 'zod';
export * from './values/storm';
import {
  STORM_LOCATIONS,
  type MarginBand,
  type ReadinessStatus,
  type StormLocation,
} from './values/storm';

const knots = (label: string) =>
  z
    .number({ error: `${label} must be a number of knots` })
    .finite(`${label} must be a number of knots`)
    .min(10, `${label} must be at least 10 kn`)
    .max(100, `${label} must be at most 100 kn (the calculations stop there)`);

const isoDate = (label: string) =>
  z.iso.datetime({ offset: true, error: `${label} must be a date and time` });

const checklistItemSchema = z.object({
  id: z
    .string()
    .trim()
    .regex(/^[a-z0-9-]{1,40}$/, 'Item ids are lower-case letters, digits and dashes'),
  label: z.string().trim().min(1, 'Name the item').max(160, 'Keep an item under 160 characters'),
});
export type StormChecklistItem = z.infer<typeof checklistItemSchema>;

/** The checklist a club starts with (common practice of storm preparation afloat). */
export const DEFAULT_STORM_CHECKLIST: StormChecklistItem[] = [
  { id: 'chafe-gear', label: 'Chafe gear at every fairlead and chock' },
  { id: 'snubbers', label: 'Doubled snubbers or a bridle rigged' },
  { id: 'windage', label: 'Windage off: sails, canvas and dinghy stowed or ashore' },
  { id: 'second-anchor', label: 'Second anchor ready to let go' },
  { id: 'taped', label: 'Mast boot and hatches taped' },
  { id: 'bilge-pumps', label: 'Bilge pumps tested, batteries charged' },
  { id: 'contacts', label: 'Contact numbers left with the club and your buddy' },
];

/** The club's checklist template (moderators and admins edit it). */
export const stormChecklistSchema = z.object({
  items: z
    .array(checklistItemSchema)
    .min(1, 'Keep at least one item')
    .max(30, 'At most 30 items')
    .refine((items) => new Set(items.map((i) => i.id)).size === items.length, {
      message: 'Two items share an id',
    }),
});
export type StormChecklistInput = z.input<typeof stormChecklistSchema>;

/** Opening a storm watch. */
export const stormWatchInputSchema = z
  .object({
    name: z
      .string({ error: 'Name the storm or the watch' })
      .trim()
      .min(2, 'Name the storm or the watch')
      .max(80, 'Keep the name under 80 characters'),
    sustainedKn: knots('Peak sustained wind'),
    gustKn: knots('Gusts'),
    surgeM: z
      .number({ error: 'Surge must be a number of metres' })
      .finite('Surge must be a number of metres')
      .min(0, 'Surge cannot be negative')
      .max(5, 'Surge must be at most 5 m')
      .default(0),
    arrivesAt: isoDate('Arrival'),
    endsAt: isoDate('End'),
    harborIds: z
      .array(z.number().int().positive(), { error: 'Choose the harbours affected' })
      .min(1, 'Choose at least one harbour')
      .max(50),
    note: z.string().trim().max(4000, 'Keep the note under 4,000 characters').default(''),
    shareDetails: z.boolean().default(false),
  })
  .superRefine((v, ctx) => {
    if (v.gustKn < v.sustainedKn)
      ctx.addIssue({
        code: 'custom',
        path: ['gustKn'],
        message: 'Gusts cannot be lower than the sustained wind',
      });
    if (Date.parse(v.endsAt) <= Date.parse(v.arrivesAt))
      ctx.addIssue({ code: 'custom', path: ['endsAt'], message: 'The end must be after arrival' });
  });
export type StormWatchInput = z.input<typeof stormWatchInputSchema>;

export const stormCloseSchema = z.object({
  lessons: z
    .string({ error: 'Write a short lessons note' })
    .trim()
    .min(3, 'Write a short lessons note')
    .max(4000, 'Keep the note under 4,000 characters'),
  /** Also start a draft knowledge post from the note, for the moderator to edit and publish. */
  makePost: z.boolean().default(false),
});
export type StormCloseInput = z.input<typeof stormCloseSchema>;

/** A member's readiness for one boat. */
export const readinessInputSchema = z.object({
  location: z.enum(STORM_LOCATIONS, { error: 'Choose where the boat will be' }).nullable(),
  planId: z.number().int().positive().nullable().default(null),
  depthM: z
    .number({ error: 'Depth must be a number of metres' })
    .finite('Depth must be a number of metres')
    .min(0.5, 'Depth must be at least 0.5 m')
    .max(100, 'Depth must be at most 100 m')
    .nullable()
    .default(null),
  ticked: z.array(z.string().max(40)).max(30).default([]),
  helpWanted: z.boolean().default(false),
  helpNote: z.string().trim().max(500, 'Keep the note under 500 characters').default(''),
});
export type ReadinessInput = z.input<typeof readinessInputSchema>;

export const buddyInputSchema = z.object({
  buddyUserId: z.number({ error: 'Choose a member' }).int().positive().nullable(),
});

export const boardQuerySchema = z.object({
  harborId: z.coerce.number().int().positive().optional(),
});

export interface StormWatchDto {
  id: number;
  name: string;
  sustainedKn: number;
  gustKn: number;
  surgeM: number;
  arrivesAt: string;
  endsAt: string;
  harborIds: number[];
  note: string;
  shareDetails: boolean;
  status: 'open' | 'closed';
  checklist: StormChecklistItem[];
  openedBy: string;
  closedAt: string | null;
  lessons: string | null;
  lessonsPostId: number | null;
  createdAt: string;
}

/** A plan checked against the forecast gust by @app/calc's tacklePlan. */
export interface StormCheckDto {
  planId: number;
  planName: string;
  /** The wind the check used: the forecast gust, kn. */
  windKn: number;
  sustainedKn: number;
  loadN: number;
  /** Null when the plan has no rated part to check. */
  band: MarginBand | null;
  /** The part with the lowest WLL margin at the gust. */
  weakestLink: { label: string; wllMargin: number; breakFactor: number } | null;
  /** Same part's WLL margin at the sustained wind. */
  sustainedMargin: number | null;
  parts: Array<{ label: string; wllMargin: number; breakFactor: number }>;
  depthM: number;
  /** Tide still to come in the plan plus the forecast surge, m. */
  tideM: number;
  scopeRatio: number | null;
  /** @app/calc's recommendTackle for the boat at the same gust and water, to set beside the plan's gear. */
  recommended: {
    chain: { grade: string; tradeSizeIn: number } | null;
    shackleIn: number | null;
    anchorKg: number | null;
    scopeRatio: number;
    basis: string;
  } | null;
  warnings: string[];
  cautions: string[];
  basis: string;
}

export interface ReadinessDto {
  boatId: number;
  boatName: string;
  ownerId: number;
  ownerName: string;
  harborId: number | null;
  status: ReadinessStatus;
  /** Present when the viewer may see the details (own boat, buddy, moderator, or the watch shares them). */
  details: {
    location: StormLocation | null;
    planId: number | null;
    depthM: number | null;
    ticked: string[];
    helpWanted: boolean;
    helpNote: string;
    buddy: { id: number; name: string } | null;
    check: StormCheckDto | null;
    updatedAt: string | null;
  } | null;
  mine: boolean;
}

export interface StormWatchDetailDto {
  watch: StormWatchDto;
  mine: ReadinessDto[];
  buddyOf: ReadinessDto[];
  cautions: string[];
}
