/** Rope fibres the calculators know. */
export type RopeMaterial = 'nylon' | 'polyester';
/** Rope constructions the calculators know. */
export type RopeConstruction = 'three-strand' | 'double-braid';

/** Every rope fibre, for pickers. */
export const ROPE_MATERIALS: readonly RopeMaterial[] = ['nylon', 'polyester'];
/** Every rope construction, for pickers. */
export const ROPE_CONSTRUCTIONS: readonly RopeConstruction[] = ['three-strand', 'double-braid'];
/** Human labels for the fibres. */
export const ROPE_MATERIAL_LABELS: Readonly<Record<RopeMaterial, string>> = {
  nylon: 'nylon',
  polyester: 'polyester',
};
/** Human labels for the constructions. */
export const ROPE_CONSTRUCTION_LABELS: Readonly<Record<RopeConstruction, string>> = {
  'three-strand': 'three-strand',
  'double-braid': 'double braid',
};

/** A diameter and a force in lbf. */
export interface RopePoint {
  diameterIn: number;
  lbf: number;
}

/**
 * Minimum breaking strength of nylon three-strand, lbf (general engineering reference
 * tables, seen).
 */
export const NYLON_THREE_STRAND_MBS: readonly RopePoint[] = [
  { diameterIn: 3 / 8, lbf: 3240 },
  { diameterIn: 1 / 2, lbf: 5670 },
  { diameterIn: 5 / 8, lbf: 8910 },
  { diameterIn: 3 / 4, lbf: 12780 },
  { diameterIn: 7 / 8, lbf: 17280 },
  { diameterIn: 1, lbf: 22230 },
];

/** Nylon three-strand tie-down WLL, lb, 49 CFR 393.108 (CI-1303), seen. */
export const NYLON_THREE_STRAND_WLL: readonly RopePoint[] = [
  { diameterIn: 3 / 8, lbf: 278 },
  { diameterIn: 7 / 16, lbf: 410 },
  { diameterIn: 1 / 2, lbf: 525 },
  { diameterIn: 5 / 8, lbf: 935 },
  { diameterIn: 3 / 4, lbf: 1420 },
  { diameterIn: 1, lbf: 2520 },
];

/** Nylon double-braid tie-down WLL, lb, 49 CFR 393.108 (CI-1305), seen. */
export const NYLON_DOUBLE_BRAID_WLL: readonly RopePoint[] = [
  { diameterIn: 3 / 8, lbf: 336 },
  { diameterIn: 7 / 16, lbf: 502 },
  { diameterIn: 1 / 2, lbf: 655 },
  { diameterIn: 5 / 8, lbf: 1130 },
  { diameterIn: 3 / 4, lbf: 1840 },
  { diameterIn: 1, lbf: 3250 },
];

/**
 * Polyester dry strength as a fraction of nylon's at the same diameter and construction
 * (from memory, approximate; some tables list them equal, so this errs low).
 */
export const POLYESTER_STRENGTH_FRACTION = 0.9;

/**
 * Strength lost by wet nylon, as a fraction: about 15 % per UFC 4-159-03, about half per
 * the Boat Mechanical Systems Handbook; the sources disagree, so callers may override it. Polyester loses about none (from
 * memory).
 */
export const NYLON_WET_LOSS_DEFAULT = 0.15;

/**
 * Cargo tie-down design factor assumed for polyester, where the reference holds no CFR row:
 * the factor the nylon rows imply (about 9–12) taken at its upper end (derived).
 */
export const POLYESTER_TIE_DOWN_FACTOR = 12;

/** Standard rope diameters in inches, within the tables' range. */
export const ROPE_DIAMETERS_IN: readonly number[] = [
  3 / 8,
  7 / 16,
  1 / 2,
  9 / 16,
  5 / 8,
  3 / 4,
  7 / 8,
  1,
];

/** Standard metric rope diameters in mm, within the tables' range (9.5–25.4 mm). */
export const ROPE_DIAMETERS_MM: readonly number[] = [10, 12, 14, 16, 18, 20, 22, 24];
