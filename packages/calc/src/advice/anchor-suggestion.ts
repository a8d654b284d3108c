import { STANDARD_CAUTIONS } from '../cautions';
import { requireNumber, requireObject, requireOneOf } from '../internal/validate';
import { designLoad, type DesignLoadResult } from '../loads/design-load';
import {
  ANCHOR_EFFICIENCY,
  ANCHOR_TYPE_LABELS,
  ANCHOR_TYPES,
  BOTTOM_TYPE_LABELS,
  BOTTOM_TYPES,
  BURIAL_BOTTOMS,
  DEFAULT_BOTTOM,
  HOLDING_CURVES,
  type AnchorType,
  type BottomType,
  type BurialBottom,
  type HoldingCurve,
} from '../tables/anchor-holding';
import type { HullType } from '../tables/abyc-h40';
import { anchorMassForHoldingKg, heavyBoatFactor } from './anchor-holding';

/** Wind a working anchor must survive whatever the plan's wind: a squall (the ABYC storm column). */
export const WORKING_ANCHOR_MIN_KN = 42;

/** Input of {@link anchorSuggestion}. */
export interface AnchorSuggestionInput {
  loaM: number;
  beamM?: number;
  hull: HullType;
  /** Displacement, kg: a boat heavy for its length pulls harder (see heavyBoatFactor). */
  displacementKg?: number;
  windKn: number;
  anchorType: AnchorType;
  /** Seabed; when omitted the middle bottom (firm mud or mixed) is assumed and soft mud shown beside it. */
  bottom?: BottomType;
  extrapolate?: boolean;
}

/** Masses for one bottom. */
export interface AnchorMasses {
  /** Holds the load at the plan's wind, kg (factor of safety 1.0, UFC 4-159-03 Table 3-7 for anchoring). */
  minKg: number;
  /** Holds the load at max(wind, 42 kn), kg: the working anchor to carry. */
  suggestedKg: number;
}

/** Result of {@link anchorSuggestion}. */
export interface AnchorSuggestionResult {
  /** Null on rock and weed, where no holding curve applies. */
  minKg: number | null;
  /** Null on rock and weed. */
  suggestedKg: number | null;
  /** The same masses in soft mud, when the bottom was not given. */
  softMud: AnchorMasses | null;
  bottomAssumed: BottomType;
  bottomGiven: boolean;
  /** The holding curve used, or null on rock and weed. */
  holdingCurve: (HoldingCurve & { bottom: BurialBottom }) | null;
  /** Holding of this type ÷ a scoop's of the same mass. */
  efficiency: number;
  /** Design load at the plan's wind, N. */
  loadN: number;
  /** The wind the suggested mass is sized for, kn: max(wind, 42). */
  suggestedForKn: number;
  /** Design load at suggestedForKn, N. */
  suggestedLoadN: number;
  /** Multiplier on the load for a heavy boat (1 when typical or not given). */
  heavyBoatFactor: number;
  designLoad: DesignLoadResult;
  basis: string;
  cautions: readonly string[];
}

function massesIn(
  type: AnchorType,
  bottom: BurialBottom,
  loadN: number,
  suggestedLoadN: number,
): AnchorMasses {
  return {
    minKg: anchorMassForHoldingKg(type, bottom, loadN),
    suggestedKg: anchorMassForHoldingKg(type, bottom, suggestedLoadN),
  };
}

const isBurial = (b: BottomType): b is BurialBottom =>
  (BURIAL_BOTTOMS as readonly BottomType[]).includes(b);

/**
 * Anchor mass for a boat and wind from a drag-anchor holding curve H = H_R·(W/W_R)^b (UFC
 * 4-159-03 eq. 26 form, after NCEL TDS 83-08R, seen; small-craft figures from memory and
 * calibrated to handbook examples and practice) for the type and bottom. minKg holds the
 * ABYC-table load at the plan's wind; suggestedKg holds it at max(wind, 42 kn), because a
 * working anchor must survive a squall. No extra margin on mass. Rock and weed: a caution,
 * not a mass. Makers' sizing charts take precedence.
 */
export function anchorSuggestion(input: AnchorSuggestionInput): AnchorSuggestionResult {
  const raw = requireObject(input, '');
  const anchorType = requireOneOf(raw.anchorType, 'anchorType', ANCHOR_TYPES);
  const bottomGiven = raw.bottom !== undefined;
  const bottom = bottomGiven ? requireOneOf(raw.bottom, 'bottom', BOTTOM_TYPES) : DEFAULT_BOTTOM;
  const displacementKg =
    raw.displacementKg === undefined
      ? undefined
      : requireNumber(raw.displacementKg, 'displacementKg', 0, 500000, 'min');
  const load = designLoad(input);
  const suggestedForKn = Math.max(input.windKn, WORKING_ANCHOR_MIN_KN);
  const atSuggested =
    suggestedForKn === input.windKn ? load : designLoad({ ...input, windKn: suggestedForKn });
  const heavy = heavyBoatFactor(input.loaM, displacementKg);
  const loadN = load.loadN * heavy;
  const suggestedLoadN = atSuggested.loadN * heavy;
  const masses = isBurial(bottom) ? massesIn(anchorType, bottom, loadN, suggestedLoadN) : null;
  const softMud = bottomGiven ? null : massesIn(anchorType, 'mud', loadN, suggestedLoadN);
  return {
    minKg: masses?.minKg ?? null,
    suggestedKg: masses?.suggestedKg ?? null,
    softMud,
    bottomAssumed: bottom,
    bottomGiven,
    holdingCurve: isBurial(bottom) ? { ...HOLDING_CURVES[bottom], bottom } : null,
    efficiency: ANCHOR_EFFICIENCY[anchorType],
    loadN: load.loadN,
    suggestedForKn,
    suggestedLoadN: atSuggested.loadN,
    heavyBoatFactor: heavy,
    designLoad: load,
    basis: describe(anchorType, bottom, bottomGiven, suggestedForKn, heavy),
    cautions: anchorCautions(anchorType, bottom, heavy),
  };
}

function describe(
  type: AnchorType,
  bottom: BottomType,
  bottomGiven: boolean,
  suggestedForKn: number,
  heavy: number,
): string {
  const label = ANCHOR_TYPE_LABELS[type];
  if (!isBurial(bottom)) {
    return `On ${BOTTOM_TYPE_LABELS[bottom]} an anchor holds by hooking or not at all, so no holding curve gives a mass: choose another spot, or size the anchor for a burying bottom and set it with care.`;
  }
  const curve = HOLDING_CURVES[bottom];
  const eff = ANCHOR_EFFICIENCY[type];
  return (
    `Holding follows a drag-anchor power law, H = H_R × (W ÷ ${curve.refKg} kg)^${curve.exponent} (the form of UFC 4-159-03 eq. 26, after NCEL TDS 83-08R; ` +
    `exponent from its Table 5-3, from memory), with H_R = ${(curve.refHoldingN / 1000).toFixed(1)} kN for a well-set scoop in ${BOTTOM_TYPE_LABELS[bottom]}` +
    (bottomGiven
      ? ''
      : ' (the middle bottom, taken because none is given; soft mud is shown beside it)') +
    ` (calibrated to handbook examples and to what cruisers carry, from memory)` +
    (eff === 1
      ? ''
      : `, times ${eff} for a ${label} (relative to a scoop, common practice, from memory)`) +
    `. The minimum holds the table load at the plan's wind with a factor of safety of 1.0, as UFC 4-159-03 Table 3-7 uses for a vessel's own anchoring (seen); ` +
    `the suggested working anchor holds it at ${suggestedForKn} kn, because a working anchor must survive a squall.` +
    (heavy > 1
      ? ` The load is raised ×${heavy.toFixed(2)} because the boat is heavy for its length (common practice, approximate).`
      : '')
  );
}

function anchorCautions(type: AnchorType, bottom: BottomType, heavy: number): string[] {
  const list = [
    ...STANDARD_CAUTIONS,
    "An anchor maker's sizing chart for your boat takes precedence over this estimate.",
    'Holding depends on setting the anchor well: back down on it and watch transits before trusting it.',
    'Measured holding scatters by a factor of two or more with the bottom, the set and the anchor itself.',
  ];
  if (bottom === 'rock')
    list.push('On rock an anchor holds by hooking, not by burying: holding is unpredictable.');
  if (bottom === 'weed')
    list.push('Weed keeps many anchors from penetrating: check the set, or choose another spot.');
  if (bottom === 'mud')
    list.push(
      'Soft mud holds about half as well as a firm bottom: let out more scope and allow time to set.',
    );
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
  if (heavy > 1)
    list.push(
      'A heavy boat for its length surges harder at anchor: its anchor is sized up for that.',
    );
  return list;
}
