import { withFieldPrefix } from '../errors';
import { chainSpec, chainSpecMetric, type ChainSpecResult } from '../ratings/chain-spec';
import { ropeSpec, type RopeSpecResult } from '../ratings/rope-spec';
import { shackleSpec } from '../ratings/shackle-spec';
import { SHACKLE_DESIGN_FACTOR } from '../tables/shackle-rrc';
import type { ChainGrade } from '../tables/chain-cfr';
import type { CheckedPlan, ConnectorKind, PlanConnector } from './plan-input';

/** A rated chain in a plan. */
export interface PlanChainRating extends ChainSpecResult {
  grade: ChainGrade;
  lengthM: number;
}

/** A rated rope (rode or snubber) in a plan. */
export interface PlanRopeRating extends RopeSpecResult {
  diameterMm: number;
  lengthM: number;
}

/** Where a connector's rating came from. */
export type RatingSource = 'table' | 'given' | 'derived';

/** A rated connector in a plan. */
export interface PlanConnectorRating {
  label: string;
  kind: ConnectorKind;
  wllN: number;
  minBreakN: number;
  ratingSource: RatingSource;
  basis: string;
}

/** Eye splice strength as a fraction of the rope's (common practice, from memory). */
export const SPLICE_EFFICIENCY = 0.9;

/** Rates the plan's chain from the table (trade size) or the metric convention. */
export function rateChain(plan: CheckedPlan): PlanChainRating | null {
  const chain = plan.components.chain;
  if (chain === undefined) return null;
  const { grade, lengthM, tradeSizeIn, nominalMm } = chain;
  const spec = withFieldPrefix('components.chain', () =>
    tradeSizeIn !== undefined
      ? chainSpec({ grade, tradeSizeIn })
      : chainSpecMetric({ grade, nominalMm: nominalMm ?? 0, extrapolate: plan.extrapolate }),
  );
  return {
    ...spec,
    grade,
    lengthM,
  };
}

/** Rates the plan's rope rode or snubber. */
export function rateRope(plan: CheckedPlan, which: 'rode' | 'snubber'): PlanRopeRating | null {
  const rope = plan.components[which];
  if (rope === undefined) return null;
  const spec = withFieldPrefix(`components.${which}`, () =>
    ropeSpec({
      material: rope.material,
      construction: rope.construction ?? 'three-strand',
      diameterMm: rope.diameterMm,
      wet: plan.wet,
      extrapolate: plan.extrapolate,
    }),
  );
  return {
    minBreakN: spec.minBreakN,
    wllN: spec.wllN,
    tieDownWllN: spec.tieDownWllN,
    wllBasis: spec.wllBasis,
    extrapolated: spec.extrapolated,
    basis: spec.basis,
    cautions: spec.cautions,
    diameterMm: rope.diameterMm,
    lengthM: rope.lengthM,
  };
}

/**
 * Rates a connector: a given WLL and breaking strength win; a shackle with only a size is
 * rated from the shackle table; one figure alone gives the other by the RR-C-271D factor 5;
 * a splice without figures keeps 90 % of the rope (common practice, from memory). Returns
 * null when nothing rates it.
 */
export function rateConnector(
  connector: PlanConnector,
  index: number,
  rode: PlanRopeRating | null,
): PlanConnectorRating | null {
  const { label, kind, nominalIn, wllN, minBreakN } = connector;
  if (wllN !== undefined && minBreakN !== undefined) {
    return {
      label,
      kind,
      wllN,
      minBreakN,
      ratingSource: 'given',
      basis: 'Ratings as entered (from the maker).',
    };
  }
  if (
    kind === 'shackle' &&
    nominalIn !== undefined &&
    wllN === undefined &&
    minBreakN === undefined
  ) {
    const spec = withFieldPrefix(`components.connectors[${index}]`, () =>
      shackleSpec({ nominalIn }),
    );
    return {
      label,
      kind,
      wllN: spec.wllN,
      minBreakN: spec.minBreakN,
      ratingSource: 'table',
      basis: spec.basis,
    };
  }
  if (wllN !== undefined || minBreakN !== undefined) {
    const wll = wllN ?? (minBreakN ?? 0) / SHACKLE_DESIGN_FACTOR;
    return {
      label,
      kind,
      wllN: wll,
      minBreakN: minBreakN ?? wll * SHACKLE_DESIGN_FACTOR,
      ratingSource: 'derived',
      basis:
        'The missing figure is derived with the RR-C-271D design factor 5 (breaking = 5 × WLL).',
    };
  }
  if (kind === 'splice' && rode !== null) {
    return {
      label,
      kind,
      wllN: rode.wllN * SPLICE_EFFICIENCY,
      minBreakN: rode.minBreakN * SPLICE_EFFICIENCY,
      ratingSource: 'derived',
      basis:
        'A well-made eye splice keeps about 90 % of the rope’s strength (common practice, from memory).',
    };
  }
  return null;
}
