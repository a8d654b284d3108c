import {
  anchorSuggestion,
  designLoad,
  rodeSuggestion,
  snubberSuggestion,
  CalcInputError,
  type AnchorSuggestionResult,
  type AnchorType,
  type DesignLoadResult,
  type RodeSuggestionResult,
  type SnubberSuggestionResult,
} from '@app/calc';
import type { BoatDto, PlanComponents } from '@app/shared';

/** What Rodewise suggests for one boat at one wind. */
export interface Recommendation {
  windKn: number;
  anchorType: AnchorType;
  load: DesignLoadResult;
  anchor: AnchorSuggestionResult;
  rode: RodeSuggestionResult;
  snubber: SnubberSuggestionResult;
  /** Chain WLL ÷ load and breaking ÷ load of the suggested chain, when there is one. */
  chainMargin: { wll: number; breaking: number } | null;
  warnings: string[];
}

/** A recommendation, or the calculation's message when the boat is outside what it can size. */
export type RecommendationOutcome =
  { ok: true; value: Recommendation } | { ok: false; field: string; message: string };

const boatLoad = (boat: BoatDto) => ({
  loaM: boat.loaM,
  hull: boat.hull,
  extrapolate: true,
  ...(boat.beamM === null ? {} : { beamM: boat.beamM }),
});

/**
 * Anchor, chain, nylon rode and snubber for `boat` at `windKn` with an anchor of `anchorType`: the
 * ABYC-table design load (designLoad), the holding model (anchorSuggestion), the chain and nylon
 * sizing (rodeSuggestion, in the gypsy's grade when the boat has one) and the snubber
 * (snubberSuggestion). Never throws for bad boat data: a calc RangeError comes back as a message.
 */
export function recommendFor(
  boat: BoatDto,
  windKn: number,
  anchorType: AnchorType,
): RecommendationOutcome {
  try {
    const load = designLoad({ ...boatLoad(boat), windKn });
    const anchor = anchorSuggestion({
      ...boatLoad(boat),
      windKn,
      anchorType,
      ...(boat.displacementKg === null ? {} : { displacementKg: boat.displacementKg }),
    });
    const rode = rodeSuggestion({
      loadN: load.loadN,
      anchorKg: anchor.suggestedKg,
      grade: boat.gypsy?.grade ?? 'G43',
    });
    const snubber = snubberSuggestion({ loadN: load.loadN });
    const warnings = [...rode.warnings, ...snubber.warnings];
    if (load.extrapolated) warnings.push('This load lies beyond the ABYC table: an extrapolation.');
    const gypsyIn = boat.gypsy?.tradeSizeIn;
    if (rode.chain && gypsyIn !== undefined && rode.chain.tradeSizeIn > gypsyIn + 1e-9) {
      warnings.push(
        'The suggested chain is larger than your windlass gypsy takes: consider a higher grade of the gypsy size.',
      );
    }
    const chainMargin = rode.chain
      ? { wll: rode.chain.wllN / load.loadN, breaking: rode.chain.minBreakN / load.loadN }
      : null;
    return {
      ok: true,
      value: { windKn, anchorType, load, anchor, rode, snubber, chainMargin, warnings },
    };
  } catch (error) {
    if (error instanceof CalcInputError) {
      return { ok: false, field: error.field, message: error.message };
    }
    throw error;
  }
}

const round = (value: number, step: number) => Math.ceil(value / step) * step;

/**
 * The ground tackle of a recommendation as a plan's components: the anchor at its suggested mass,
 * the suggested chain (or nylon rode) at `scope` : 1 for `depthM`, and the snubber.
 */
export function recommendedComponents(
  rec: Recommendation,
  boat: BoatDto,
  depthM: number,
  scope: number,
): PlanComponents {
  const rodeM = Math.min(500, round(scope * (depthM + boat.bowHeightM), 1));
  const components: PlanComponents = {
    anchor: {
      type: rec.anchorType,
      massKg: Math.min(500, Math.max(0.5, round(rec.anchor.suggestedKg, 0.5))),
    },
    snubber: {
      material: 'nylon',
      diameterMm: Math.round(rec.snubber.diameterMm * 10) / 10,
      lengthM: Math.round(rec.snubber.lengthM * 10) / 10,
    },
    connectors: [],
  };
  if (rec.rode.chain) {
    components.chain = {
      grade: rec.rode.chain.grade,
      tradeSizeIn: rec.rode.chain.tradeSizeIn,
      lengthM: rodeM,
    };
  } else if (rec.rode.nylon) {
    components.rode = {
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: rec.rode.nylon.sizeMm,
      lengthM: rodeM,
    };
  }
  return components;
}
