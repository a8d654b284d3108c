import { z } from 'zod';
import { numberField } from './fields';
import { nonEmptyPatchOf, patchOf } from './patch';
export * from './values/boats';
import {
  ANCHOR_KINDS,
  BOTTOMS,
  CHAIN_GRADE_IDS,
  CONNECTOR_KINDS,
  HULLS,
  PLAN_CONDITIONS,
  type Hull,
  type PlanCondition,
} from './values/boats';

/** Chain size: a trade size in inches or a metric nominal size in mm (exactly one). */
export const chainSizeSchema = z
  .object({
    grade: z.enum(CHAIN_GRADE_IDS, { error: 'Choose a chain grade' }),
    tradeSizeIn: numberField('Trade size', 0.1, 2, 'in').optional(),
    nominalMm: numberField('Nominal size', 3, 50, 'mm').optional(),
  })
  .refine((c) => (c.tradeSizeIn === undefined) !== (c.nominalMm === undefined), {
    message: 'Give either a trade size (in) or a metric size (mm)',
    path: ['tradeSizeIn'],
  });

/** Everything a boat profile holds; stored in SI units. */
export const boatInputSchema = z.object({
  name: z
    .string({ error: 'Name is required' })
    .trim()
    .min(1, 'Name is required')
    .max(80, 'Name is too long'),
  hull: z.enum(HULLS, { error: 'Choose sail, power or multihull' }),
  loaM: numberField('Length overall', 2, 60, 'm'),
  beamM: numberField('Beam', 0.5, 20, 'm').nullable().optional(),
  displacementKg: numberField('Displacement', 50, 500000, 'kg').nullable().optional(),
  draftM: numberField('Draft', 0.1, 10, 'm').nullable().optional(),
  bowHeightM: numberField('Bow-roller height', 0, 8, 'm').default(1),
  gypsy: chainSizeSchema.nullable().optional(),
  homeHarborId: z.number().int().positive().nullable().optional(),
});
export type BoatInput = z.input<typeof boatInputSchema>;
/** A change to a boat: only the fields sent change (no defaults, so bow height is never reset). */
export const boatPatchSchema = nonEmptyPatchOf(boatInputSchema);

export interface BoatDto {
  id: number;
  name: string;
  hull: Hull;
  loaM: number;
  beamM: number | null;
  displacementKg: number | null;
  draftM: number | null;
  bowHeightM: number;
  gypsy: z.infer<typeof chainSizeSchema> | null;
  homeHarborId: number | null;
  createdAt: string;
  updatedAt: string;
}

export const planComponentsSchema = z.object({
  anchor: z
    .object({
      type: z.enum(ANCHOR_KINDS, { error: 'Choose an anchor type' }),
      massKg: numberField('Anchor mass', 0.5, 500, 'kg'),
    })
    .optional(),
  chain: chainSizeSchema
    .and(z.object({ lengthM: numberField('Chain length', 0, 500, 'm') }))
    .optional(),
  rode: z
    .object({
      material: z.enum(['nylon', 'polyester']),
      construction: z.enum(['three-strand', 'double-braid']),
      diameterMm: numberField('Rope diameter', 6, 40, 'mm'),
      lengthM: numberField('Rope length', 0, 500, 'm'),
    })
    .optional(),
  snubber: z
    .object({
      material: z.enum(['nylon', 'polyester']),
      diameterMm: numberField('Snubber diameter', 6, 40, 'mm'),
      lengthM: numberField('Snubber length', 0.5, 60, 'm'),
      count: z.union([z.literal(1), z.literal(2)], { error: 'One or two snubbers' }).optional(),
    })
    .optional(),
  /** The nylon for a chain-and-rope rode the recommendation offered beside an all-chain rode (not in the load path). */
  nylonAlternative: z
    .object({
      material: z.literal('nylon'),
      construction: z.literal('three-strand'),
      diameterMm: numberField('Rope diameter', 6, 40, 'mm'),
      lengthM: numberField('Rope length', 0, 500, 'm'),
    })
    .optional(),
  connectors: z
    .array(
      z.object({
        label: z.string().trim().min(1, 'Name the connector').max(60),
        kind: z.enum(CONNECTOR_KINDS),
        nominalIn: numberField('Shackle size', 0.1, 2, 'in').optional(),
        wllN: numberField('Working load limit', 1, 2_000_000, 'N').optional(),
        minBreakN: numberField('Breaking strength', 1, 10_000_000, 'N').optional(),
      }),
    )
    .max(12, 'At most 12 connectors')
    .default([]),
});
export type PlanComponents = z.infer<typeof planComponentsSchema>;

export const tacklePlanInputSchema = z.object({
  boatId: z.number({ error: 'Choose a boat' }).int().positive('Choose a boat'),
  name: z.string().trim().min(1, 'Name the plan').max(80),
  condition: z.enum(PLAN_CONDITIONS),
  windKn: numberField('Design wind', 5, 120, 'kn'),
  depthM: numberField('Depth', 0.5, 100, 'm'),
  tideM: numberField('Tidal rise', 0, 15, 'm').default(0),
  bottom: z.enum(BOTTOMS).optional(),
  components: planComponentsSchema,
  notes: z.string().max(4000, 'Notes are too long').default(''),
});
export type TacklePlanInput = z.input<typeof tacklePlanInputSchema>;
/** A change to a plan: only the fields sent change (tide and notes stay unless sent). */
export const tacklePlanPatchSchema = patchOf(tacklePlanInputSchema.omit({ boatId: true }));

export interface TacklePlanDto {
  id: number;
  boatId: number;
  name: string;
  condition: PlanCondition;
  windKn: number;
  depthM: number;
  tideM: number;
  bottom: (typeof BOTTOMS)[number] | null;
  components: PlanComponents;
  notes: string;
  createdAt: string;
  updatedAt: string;
}

export const idParam = (name: string) =>
  z.object({ [name]: z.coerce.number().int().positive(`Unknown ${name}`) });
