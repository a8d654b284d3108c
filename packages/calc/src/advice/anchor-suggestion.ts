import { STANDARD_GRAVITY_MPS2 } from '../constants';
import { STANDARD_CAUTIONS } from '../cautions';
import { requireNumber, requireObject, requireOneOf } from '../internal/validate';
import { designLoad, type DesignLoadResult } from '../loads/design-load';
import {
  ANCHOR_SUGGESTED_MARGIN,
  ANCHOR_TYPE_LABELS,
  ANCHOR_TYPES,
  BOTTOM_TYPES,
  HOLDING_RATIO,
  type AnchorType,
  type BottomType,
} from '../tables/anchor-holding';
import type { HullType } from '../tables/abyc-h40';
import { KG_PER_LB, M_PER_FT } from '../units/units';

/** Input of {@link anchorSuggestion}. */
export interface AnchorSuggestionInput {
  loaM: number;
  beamM?: number;
  hull: HullType;
  /** Displacement, kg; used for a heavy-boat caution only. */
  displacementKg?: number;
  windKn: number;
  anchorType: AnchorType;
  /** Seabed; when omitted the poorest of sand, mud and clay is assumed. */
  bottom?: BottomType;
  extrapolate?: boolean;
}

/** Result of {@link anchorSuggestion}. */
export interface AnchorSuggestionResult {
  /** Lightest anchor that holds the design load by the model, kg. */
  minKg: number;
  /** minKg × 1.5, kg. */
  suggestedKg: number;
  /** Holding force ÷ anchor weight used. */
  holdingRatio: number;
  bottomAssumed: BottomType;
  loadN: number;
  designLoad: DesignLoadResult;
  basis: string;
  cautions: readonly string[];
}

const SOFT_BOTTOMS: readonly BottomType[] = ['sand', 'mud', 'clay'];

function poorestSoft(type: AnchorType): BottomType {
  let worst: BottomType = 'sand';
  for (const bottom of SOFT_BOTTOMS) {
    if (HOLDING_RATIO[type][bottom] < HOLDING_RATIO[type][worst]) worst = bottom;
  }
  return worst;
}

/**
 * Anchor mass for a boat and wind. Holding model (Rodewise's, common practice, approximate):
 * minKg = design load ÷ (holding ratio × g), with the ABYC-table design load and a holding
 * ratio per anchor type and bottom (from memory); suggestedKg = 1.5 × minKg. Proportional,
 * hence monotonic, in the load. Makers' sizing charts take precedence.
 */
export function anchorSuggestion(input: AnchorSuggestionInput): AnchorSuggestionResult {
  const raw = requireObject(input, '');
  const anchorType = requireOneOf(raw.anchorType, 'anchorType', ANCHOR_TYPES);
  const bottom =
    raw.bottom === undefined
      ? poorestSoft(anchorType)
      : requireOneOf(raw.bottom, 'bottom', BOTTOM_TYPES);
  const displacementKg =
    raw.displacementKg === undefined
      ? undefined
      : requireNumber(raw.displacementKg, 'displacementKg', 0, 500000, 'min');
  const load = designLoad(input);
  const ratio = HOLDING_RATIO[anchorType][bottom];
  const minKg = load.loadN / (ratio * STANDARD_GRAVITY_MPS2);
  return {
    minKg,
    suggestedKg: minKg * ANCHOR_SUGGESTED_MARGIN,
    holdingRatio: ratio,
    bottomAssumed: bottom,
    loadN: load.loadN,
    designLoad: load,
    basis:
      `Minimum mass = design load ÷ (${ratio} × g): we assume a well-set ${ANCHOR_TYPE_LABELS[anchorType]} anchor in ${bottom} ` +
      `holds about ${ratio} times its own weight at a scope of 5:1 or more (our model, from memory, approximate)` +
      (raw.bottom === undefined
        ? ', taking the poorest of sand, mud and clay as the bottom is not given'
        : '') +
      `. Suggested = 1.5 × minimum for gusts, veering and an imperfect set (common practice).`,
    cautions: anchorCautions(anchorType, bottom, input.loaM, displacementKg),
  };
}

function anchorCautions(
  type: AnchorType,
  bottom: BottomType,
  loaM: number,
  displacementKg: number | undefined,
): string[] {
  const list = [
    ...STANDARD_CAUTIONS,
    "An anchor maker's sizing chart for your boat takes precedence over this estimate.",
    'Holding depends on setting the anchor well: back down on it and watch transits before trusting it.',
  ];
  if (bottom === 'rock')
    list.push('On rock an anchor holds by hooking, not by burying: holding is unpredictable.');
  if (bottom === 'weed')
    list.push('Weed keeps many anchors from penetrating: check the set, or choose another spot.');
  if (type === 'grapnel')
    list.push(
      'A grapnel suits dinghies, small craft and rock; it is not a primary anchor for a cruising boat.',
    );
  if (type === 'fluke')
    list.push('A fluke anchor may not reset when the wind or tide turns it round.');
  if (type === 'fisherman')
    list.push(
      'A fisherman anchor holds mostly by weight and one fluke; the rode can foul the upper arm.',
    );
  if (displacementKg !== undefined) {
    // Displacement-length style ratio on LOA (common practice uses waterline length).
    const dl = displacementKg / KG_PER_LB / 2240 / (0.01 * (loaM / M_PER_FT)) ** 3;
    if (dl > 300)
      list.push('A heavy boat for its length surges harder at anchor: consider a size up.');
  }
  return list;
}
