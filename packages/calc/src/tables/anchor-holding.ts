/** Anchor types, by generic form. */
export type AnchorType = 'plow' | 'claw' | 'fluke' | 'scoop' | 'grapnel' | 'fisherman';
/** Seabed kinds. `mixed` is the middle bottom assumed when none is given. */
export type BottomType = 'sand' | 'mixed' | 'mud' | 'clay' | 'weed' | 'rock';
/** Seabeds an anchor buries in, so a holding curve applies. */
export type BurialBottom = 'sand' | 'mixed' | 'mud' | 'clay';

/** Every anchor type, for pickers. */
export const ANCHOR_TYPES: readonly AnchorType[] = [
  'plow',
  'claw',
  'fluke',
  'scoop',
  'grapnel',
  'fisherman',
];
/** Human labels for the anchor types. */
export const ANCHOR_TYPE_LABELS: Readonly<Record<AnchorType, string>> = {
  plow: 'plow',
  claw: 'claw',
  fluke: 'fluke',
  scoop: 'scoop / roll-bar',
  grapnel: 'grapnel',
  fisherman: 'fisherman',
};
/** Every seabed kind, for pickers. */
export const BOTTOM_TYPES: readonly BottomType[] = ['sand', 'mixed', 'mud', 'clay', 'weed', 'rock'];
/** Human labels for the seabed kinds. */
export const BOTTOM_TYPE_LABELS: Readonly<Record<BottomType, string>> = {
  sand: 'sand',
  mixed: 'firm mud or mixed',
  mud: 'soft mud',
  clay: 'clay',
  weed: 'weed or grass',
  rock: 'rock or coral rubble',
};
/** The bottoms with a holding curve. */
export const BURIAL_BOTTOMS: readonly BurialBottom[] = ['sand', 'mixed', 'mud', 'clay'];
/** The bottom taken when none is given: the middle of the curves. */
export const DEFAULT_BOTTOM: BurialBottom = 'mixed';

/**
 * A drag-anchor holding curve of the form of UFC 4-159-03 (2005) §5-2 eq. 26, after NCEL TDS
 * 83-08R (seen): H = H_R · (W / W_R)^b with b < 1, so small anchors hold more per kilogram than
 * large ones. Here W_R is a small-craft reference mass and H_R the holding of a new-generation
 * scoop of that mass (type efficiencies scale it, see ANCHOR_EFFICIENCY).
 */
export interface HoldingCurve {
  /** Reference anchor mass W_R, kg. */
  refKg: number;
  /** Ultimate static holding of a well-set scoop of refKg, N. */
  refHoldingN: number;
  /** Exponent b (< 1). */
  exponent: number;
  /** Certainty of the figures. */
  mark: string;
}

/** Reference mass of the small-craft curves, kg (33 lb). */
export const HOLDING_REF_KG = 15;

/**
 * Holding curves per bottom for a well-set new-generation scoop at a scope of 5:1 or more.
 * Exponents: 0.80 in sand and 0.92 in cohesive bottoms, the values of UFC 4-159-03 Table 5-3
 * (from memory). Reference holdings: the middle bottom is calibrated to the Boat Mechanical
 * Systems Handbook worked example (a 36 lb plow as the working anchor of a 32 ft power boat,
 * seen) and to what cruisers carry (common practice); sand holds about 1.25 times and soft mud
 * about half of it (common practice, from memory). Pull tests scatter by a factor of two.
 */
export const HOLDING_CURVES: Readonly<Record<BurialBottom, HoldingCurve>> = {
  sand: { refKg: HOLDING_REF_KG, refHoldingN: 13125, exponent: 0.8, mark: 'from memory' },
  mixed: { refKg: HOLDING_REF_KG, refHoldingN: 10500, exponent: 0.92, mark: 'from memory' },
  mud: { refKg: HOLDING_REF_KG, refHoldingN: 5250, exponent: 0.92, mark: 'from memory' },
  clay: { refKg: HOLDING_REF_KG, refHoldingN: 9450, exponent: 0.92, mark: 'from memory' },
};

/**
 * Holding of each type relative to a new-generation scoop of the same mass (common practice,
 * from memory): traditional plows, claws and high-tensile flukes hold somewhat less than a
 * scoop, and the Boat Mechanical Systems Handbook treats them as equivalent for sizing (seen);
 * a fisherman needs about 1.5 times a plow's mass (same handbook, seen); a grapnel is for
 * dinghies and rock, not a main anchor.
 */
export const ANCHOR_EFFICIENCY: Readonly<Record<AnchorType, number>> = {
  scoop: 1,
  plow: 0.9,
  claw: 0.85,
  fluke: 0.9,
  fisherman: 0.62,
  grapnel: 0.25,
};
