/** Anchor types, by generic form. */
export type AnchorType = 'plow' | 'claw' | 'fluke' | 'scoop' | 'grapnel' | 'fisherman';
/** Seabed kinds. */
export type BottomType = 'sand' | 'mud' | 'clay' | 'weed' | 'rock';

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
export const BOTTOM_TYPES: readonly BottomType[] = ['sand', 'mud', 'clay', 'weed', 'rock'];
/** Human labels for the seabed kinds. */
export const BOTTOM_TYPE_LABELS: Readonly<Record<BottomType, string>> = {
  sand: 'sand',
  mud: 'soft mud',
  clay: 'clay',
  weed: 'weed or grass',
  rock: 'rock or coral rubble',
};

/**
 * Holding ratio: steady horizontal holding force ÷ anchor weight in air, for a well-set
 * anchor at a scope of 5:1 or more. Rodewise's model (from memory, approximate): drag tests
 * scatter by a factor of two or more with bottom, setting and size; rock and weed hold by
 * hooking, not burial. These ratios are deliberately moderate.
 */
export const HOLDING_RATIO: Readonly<Record<AnchorType, Readonly<Record<BottomType, number>>>> = {
  plow: { sand: 30, mud: 15, clay: 25, weed: 8, rock: 5 },
  claw: { sand: 25, mud: 12, clay: 20, weed: 8, rock: 5 },
  fluke: { sand: 40, mud: 30, clay: 25, weed: 5, rock: 3 },
  scoop: { sand: 40, mud: 20, clay: 30, weed: 10, rock: 5 },
  grapnel: { sand: 5, mud: 3, clay: 5, weed: 8, rock: 10 },
  fisherman: { sand: 10, mud: 6, clay: 10, weed: 15, rock: 10 },
};

/** Suggested mass ÷ minimum mass: margin for gusts, veering and an imperfect set (common practice). */
export const ANCHOR_SUGGESTED_MARGIN = 1.5;
