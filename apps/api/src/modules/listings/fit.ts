import {
  ANCHOR_TYPE_LABELS,
  DEFAULT_DESIGN_FACTOR,
  STANDARD_CAUTIONS,
  anchorSuggestion,
  designLoad,
  inchFractionLabel,
  nToLbf,
  type AnchorType,
} from '@app/calc';
import type { FitBasisDto, FitDto } from '@app/shared';
import type { Boat } from '../../models';
import type { GypsySize, ListingRating } from './listing-specs';

/** Design wind used when the member picks none, knots (the ABYC H-40 30-knot column). */
export const DEFAULT_FIT_WIND_KN = 30;
/** A rating at least this fraction of what is needed is "marginal" rather than "too light" (Rodewise's band). */
export const MARGINAL_FRACTION = 0.75;

/** What one boat needs at one design wind; anchor figures are computed per type on first use. */
export interface BoatNeeds {
  basis: FitBasisDto;
  loadN: number;
  requiredBreakN: number;
  gypsy: GypsySize | null;
  anchor: (type: AnchorType) => { minKg: number; suggestedKg: number };
}

const kN = (newtons: number) =>
  `${(newtons / 1000).toFixed(1)} kN (${Math.round(nToLbf(newtons)).toLocaleString('en')} lbf)`;

/**
 * The boat's requirement from @app/calc: the ABYC H-40 table design load at `windKn` (extrapolated beyond the
 * table and flagged), the rope breaking strength required with DEFAULT_DESIGN_FACTOR (4, common practice), and the
 * anchor mass range per type from `anchorSuggestion` (poorest soft bottom assumed).
 */
export function boatNeeds(boat: Boat, windKn = DEFAULT_FIT_WIND_KN): BoatNeeds {
  const dims = {
    loaM: boat.loaM,
    hull: boat.hull,
    ...(boat.beamM ? { beamM: boat.beamM } : {}),
    extrapolate: true,
  };
  const load = designLoad({ ...dims, windKn });
  const anchors = new Map<AnchorType, { minKg: number; suggestedKg: number }>();
  const requiredBreakN = load.loadN * DEFAULT_DESIGN_FACTOR;
  return {
    loadN: load.loadN,
    requiredBreakN,
    gypsy: boat.gypsy ? { ...boat.gypsy } : null,
    anchor: (type) => {
      let a = anchors.get(type);
      if (!a) {
        const r = anchorSuggestion({
          ...dims,
          windKn,
          anchorType: type,
          ...(boat.displacementKg ? { displacementKg: boat.displacementKg } : {}),
        });
        a = { minKg: r.minKg, suggestedKg: r.suggestedKg };
        anchors.set(type, a);
      }
      return a;
    },
    basis: {
      boatId: boat.id,
      boatName: boat.name,
      windKn,
      designLoadN: load.loadN,
      designFactor: DEFAULT_DESIGN_FACTOR,
      explanation:
        `Design load ${kN(load.loadN)} for ${boat.name} at ${windKn} kn (ABYC H-40 horizontal load table${load.approximate ? ', approximate for this boat' : ''}). ` +
        `Chain and connectors fit when their working load limit is at least the design load (the limit already carries the maker's design factor). ` +
        `Rope fits when its wet breaking strength is at least ${DEFAULT_DESIGN_FACTOR} × the design load (${kN(requiredBreakN)}, common practice). ` +
        `Anchors fit at or above the suggested mass for their type (1.5 × the minimum, common practice). ` +
        `Within ${Math.round((1 - MARGINAL_FRACTION) * 100)} % below the requirement is marginal.`,
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
      const reason = `${rating.basis}: ${kN(rating.wllN)} against a design load of ${kN(needs.loadN)} at ${needs.basis.windKn} kn.`;
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
        reason: `${rating.basis}: ${kN(rating.minBreakN)} against the ${kN(needs.requiredBreakN)} needed (${needs.basis.designFactor} × design load at ${needs.basis.windKn} kn).`,
      };
    }
    case 'anchor': {
      const { minKg, suggestedKg } = needs.anchor(rating.anchorType);
      const status =
        rating.massKg >= suggestedKg ? 'fits' : rating.massKg >= minKg ? 'marginal' : 'too-light';
      return {
        status,
        reason: `${rating.massKg} kg ${ANCHOR_TYPE_LABELS[rating.anchorType]} against ${minKg.toFixed(1)} kg minimum and ${suggestedKg.toFixed(1)} kg suggested for this boat at ${needs.basis.windKn} kn (Rodewise's holding model, approximate).`,
      };
    }
    default:
      return { status: 'not-rated', reason: rating.basis };
  }
}
