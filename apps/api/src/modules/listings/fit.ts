import {
  ANCHOR_TYPE_LABELS,
  NYLON_ANCHORING_FACTOR,
  STANDARD_CAUTIONS,
  chainFloorIn,
  inchFractionLabel,
  nToLbf,
  recommendTackle,
  type AnchorType,
  type TackleRecommendation,
} from '@app/calc';
import type { FitBasisDto, FitDto } from '@app/shared';
import type { Boat } from '../../models';
import { calcBoatOf } from '../boats/calc-boat';
import type { GypsySize, ListingRating } from './listing-specs';

/** Design wind used when the member picks none, knots (the ABYC H-40 30-knot column). */
export const DEFAULT_FIT_WIND_KN = 30;
/** Depth the fit flags assume, m: it only sets rode lengths, which the flags do not judge. */
export const FIT_DEPTH_M = 6;
/** A rating at least this fraction of what is needed is "marginal" rather than "too light" (Rodewise's band). */
export const MARGINAL_FRACTION = 0.75;

/** What one boat needs at one design wind, from the same recommendation the boat page shows. */
export interface BoatNeeds {
  basis: FitBasisDto;
  /** The load chain and fittings must carry within their WLL: the recommendation's rode load, N. */
  loadN: number;
  /** Wet breaking strength rope must have, N. */
  requiredBreakN: number;
  /** Practice floor on chain size for the boat's length, in. */
  chainFloorIn: number;
  gypsy: GypsySize | null;
  anchor: (type: AnchorType) => { minKg: number; suggestedKg: number };
}

const kN = (newtons: number) =>
  `${(newtons / 1000).toFixed(1)} kN (${Math.round(nToLbf(newtons)).toLocaleString('en')} lbf)`;

/**
 * The boat's requirement from @app/calc's `recommendTackle` — the one recommendation every screen uses: chain and
 * fittings must carry the load the recommended chain is sized for (the ABYC H-40 load at max(wind, 42 kn), with the
 * stated storm credit), rope must have wet breaking strength of 2.25 × that load, and anchors are judged against the
 * recommendation's minimum and suggested masses per type.
 */
export function boatNeeds(boat: Boat, windKn = DEFAULT_FIT_WIND_KN): BoatNeeds {
  const recs = new Map<AnchorType, TackleRecommendation>();
  const rec = (anchorType: AnchorType) => {
    let r = recs.get(anchorType);
    if (!r) {
      r = recommendTackle({
        ...calcBoatOf(boat),
        windKn,
        anchorType,
        depthM: FIT_DEPTH_M,
        extrapolate: true,
      });
      recs.set(anchorType, r);
    }
    return r;
  };
  const base = rec('scoop');
  const loadN = base.rodeLoadN;
  const requiredBreakN = base.rode.requiredRopeBreakN;
  const floorIn = chainFloorIn(boat.loaM);
  return {
    loadN,
    requiredBreakN,
    chainFloorIn: floorIn,
    gypsy: boat.gypsy ? { ...boat.gypsy } : null,
    anchor: (type) => {
      const a = rec(type).anchor;
      return {
        minKg: a.minKg ?? Number.POSITIVE_INFINITY,
        suggestedKg: a.suggestedKg ?? Number.POSITIVE_INFINITY,
      };
    },
    basis: {
      boatId: boat.id,
      boatName: boat.name,
      windKn,
      designLoadN: loadN,
      designFactor: NYLON_ANCHORING_FACTOR,
      explanation:
        `The same recommendation as ${boat.name}'s boat page at ${windKn} kn: gear must carry ${kN(loadN)}, the ABYC H-40 table load at ${base.sizingKn} kn` +
        `${base.peakFactor < 1 ? ` × ${base.peakFactor} for the nylon in a storm rode` : ''}${base.designLoad.governedBy === 'beam' ? ', the table entered by beam' : ''}. ` +
        `Chain and connectors fit when their working load limit is at least that load (chain of new, undamaged links meets UFC 4-159-03's factor of 3 on breaking), ` +
        `and chain is no lighter than the ${inchFractionLabel(floorIn)} usually carried at this length (common practice). ` +
        `Rope fits when its wet breaking strength is at least ${NYLON_ANCHORING_FACTOR} × that load (${kN(requiredBreakN)}). ` +
        `Anchors fit at or above the suggested mass for their type (holds ${base.sizingKn} kn on a drag-anchor holding curve, firm mud or mixed bottom), and are marginal between the minimum and the suggested mass. ` +
        `Within ${Math.round((1 - MARGINAL_FRACTION) * 100)} % below a strength requirement is marginal.`,
      cautions: [
        ...STANDARD_CAUTIONS,
        "An anchor maker's sizing chart and the gear's own markings take precedence over these estimates.",
        'Used gear may be worn or corroded: inspect it, and ask a rigger or surveyor if unsure.',
      ],
    },
  };
}

const sameGypsy = (a: GypsySize, b: GypsySize) =>
  a.grade === b.grade && a.tradeSizeIn === b.tradeSizeIn && a.nominalMm === b.nominalMm;
const gypsyLabel = (g: GypsySize) =>
  `${g.grade} ${g.tradeSizeIn !== undefined ? inchFractionLabel(g.tradeSizeIn) : `${g.nominalMm ?? '?'} mm`}`;

function byRatio(have: number, need: number): FitDto['status'] {
  if (have >= need) return 'fits';
  return have >= need * MARGINAL_FRACTION ? 'marginal' : 'too-light';
}

/** Flags one listing against the boat's needs, with the reason in one sentence. */
export function fitOf(rating: ListingRating, needs: BoatNeeds): FitDto {
  switch (rating.kind) {
    case 'wll': {
      const status = byRatio(rating.wllN, needs.loadN);
      const reason = `${rating.basis}: ${kN(rating.wllN)} against the ${kN(needs.loadN)} the recommended gear carries for ${needs.basis.windKn} kn.`;
      const size = rating.gypsy?.tradeSizeIn;
      if (status === 'fits' && size !== undefined && size < needs.chainFloorIn - 1e-9)
        return {
          status: 'marginal',
          reason: `${reason} Strong enough, but lighter than the ${inchFractionLabel(needs.chainFloorIn)} chain usually carried on a boat this long: it kinks, wears and lifts more easily.`,
        };
      if (status === 'fits' && rating.gypsy && needs.gypsy && !sameGypsy(rating.gypsy, needs.gypsy))
        return {
          status: 'marginal',
          reason: `${reason} Strong enough, but your gypsy is set for ${gypsyLabel(needs.gypsy)} chain: check that this chain fits it.`,
        };
      return { status, reason };
    }
    case 'break': {
      const status = byRatio(rating.minBreakN, needs.requiredBreakN);
      return {
        status,
        reason: `${rating.basis}: ${kN(rating.minBreakN)} against the ${kN(needs.requiredBreakN)} needed (wet breaking ${needs.basis.designFactor} × the load for ${needs.basis.windKn} kn).`,
      };
    }
    case 'anchor': {
      const { minKg, suggestedKg } = needs.anchor(rating.anchorType);
      const status =
        rating.massKg >= suggestedKg ? 'fits' : rating.massKg >= minKg ? 'marginal' : 'too-light';
      return {
        status,
        reason: `${rating.massKg} kg ${ANCHOR_TYPE_LABELS[rating.anchorType]} against ${minKg.toFixed(1)} kg minimum and ${suggestedKg.toFixed(1)} kg suggested for this boat at ${needs.basis.windKn} kn (drag-anchor holding curve, approximate).`,
      };
    }
    default:
      return { status: 'not-rated', reason: rating.basis };
  }
}
