import { SHOCK_NYLON_MIN_M, UPLIFT_WARN_DEG } from '../constants';
import { withFieldPrefix } from '../errors';
import { catenary, type CatenaryResult } from '../geometry/catenary';

const SCOPE_STEPS = [5, 7, 10] as const;

const ceilTo = (value: number, step: number) => Math.ceil(value / step - 1e-9) * step;

/** Lengths of one rode layout at a scope ratio, m. */
export interface RodeLayout {
  ratio: number;
  rodeM: number;
  chainM: number;
  nylonM: number;
}

/** Input of {@link rodeLayout}; lengths in m, load in N. */
export interface RodeLayoutInput {
  /** Seabed to bow roller at high water (depth + bow height + tide), m. */
  heightM: number;
  depthM: number;
  bowHeightM: number;
  tideM: number;
  loaM: number;
  /** Storm plans get chain at the anchor, then nylon. */
  storm: boolean;
  /** Scope from the wind ladder, the first ratio tried. */
  ladderRatio: number;
  /** Horizontal load the catenary is drawn at, N. */
  horizontalLoadN: number;
  /** The chosen chain's mass, kg/m; null when there is no chain (no catenary, no step-up). */
  chainKgPerM: number | null;
}

/**
 * The rode for the ladder scope: rode = ceil(ratio × height) m, all chain; in a storm, chain
 * min(rode, ceil(max(3 × LOA, 3 × height))) then nylon of at least max(6.1 m, LOA). With chain, the
 * scope steps up 5 → 7 → 10 while the catenary lifts the anchor more than UPLIFT_WARN_DEG.
 */
export function rodeLayout(input: RodeLayoutInput): {
  layout: RodeLayout;
  shape: CatenaryResult | null;
  steppedUp: boolean;
} {
  const { heightM, depthM, bowHeightM, tideM, loaM, storm } = input;
  const layout = (ratio: number): RodeLayout => {
    let rodeM = ceilTo(ratio * heightM, 1);
    let chainM = rodeM;
    let nylonM = 0;
    if (storm) {
      chainM = Math.min(rodeM, ceilTo(Math.max(3 * loaM, 3 * heightM), 1));
      nylonM = Math.max(rodeM - chainM, ceilTo(Math.max(SHOCK_NYLON_MIN_M, loaM), 1));
      rodeM = chainM + nylonM;
    }
    return { ratio, rodeM, chainM, nylonM };
  };
  const shapeOf = (l: RodeLayout, kgPerM: number) =>
    l.rodeM > heightM
      ? withFieldPrefix('catenary', () =>
          catenary({
            depthM,
            bowHeightM,
            tideM,
            chainKgPerM: kgPerM,
            horizontalLoadN: input.horizontalLoadN,
            chainLengthM: l.chainM,
            ropeLengthM: l.nylonM,
          }),
        )
      : null;
  let plan = layout(input.ladderRatio);
  let shape: CatenaryResult | null = null;
  let steppedUp = false;
  if (input.chainKgPerM !== null) {
    shape = shapeOf(plan, input.chainKgPerM);
    for (const next of SCOPE_STEPS) {
      if (next <= plan.ratio || shape === null || shape.anchorAngleDeg <= UPLIFT_WARN_DEG) continue;
      plan = layout(next);
      shape = shapeOf(plan, input.chainKgPerM);
      steppedUp = true;
    }
  }
  return { layout: plan, shape, steppedUp };
}
