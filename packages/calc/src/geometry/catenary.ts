import { CalcInputError } from '../errors';
import {
  FRESH_WATER_DENSITY_KGPM3,
  SEA_WATER_DENSITY_KGPM3,
  STANDARD_GRAVITY_MPS2,
  STEEL_DENSITY_KGPM3,
} from '../constants';
import { cautionList } from '../cautions';
import { optionalNumber, requireNumber, requireObject, requireOneOf } from '../internal/validate';

/** Water the chain hangs in. */
export type WaterType = 'sea' | 'fresh';
/** Every water type, for pickers. */
export const WATER_TYPES: readonly WaterType[] = ['sea', 'fresh'];

/** Input of {@link catenary}. */
export interface CatenaryInput {
  /** Water depth at the anchor, m. */
  depthM: number;
  /** Bow-roller height above the water, m. */
  bowHeightM: number;
  /** Tidal rise still to come, m (default 0). */
  tideM?: number;
  /** Chain mass in air, kg/m. */
  chainKgPerM: number;
  /** Horizontal load on the rode, N. */
  horizontalLoadN: number;
  /** Chain length, m. */
  chainLengthM: number;
  /** Rope between bow and chain, m, treated as weightless and straight (default 0). */
  ropeLengthM?: number;
  water?: WaterType;
  /** Points in `profile`, 4–400 (default 50). */
  profilePoints?: number;
}

/** Result of {@link catenary}. */
export interface CatenaryResult {
  /** Height from seabed to bow roller h = depth + bow height + tide, m. */
  heightM: number;
  /** Submerged weight of the chain, N/m. */
  submergedNPerM: number;
  /** Length of rode off the seabed (rope plus hanging chain), m. */
  suspendedM: number;
  /** Chain lying on the seabed, m. */
  onBottomM: number;
  /** Horizontal distance from anchor to bow roller, m. */
  reachM: number;
  /** Tension at the bow roller, N. */
  bowTensionN: number;
  /** Angle of the rode below horizontal at the bow, degrees. */
  bowAngleDeg: number;
  /** Angle of the pull above the seabed at the anchor, degrees (0 when chain lies there). */
  anchorAngleDeg: number;
  /** True when the chain no longer lies on the seabed at the anchor: it pulls the shank up. */
  liftsAtAnchor: boolean;
  /** Rode shape for drawing: [x from the anchor, z above the seabed], metres. */
  profile: Array<[number, number]>;
  basis: string;
  cautions: readonly string[];
}

/**
 * Submerged weight per metre of steel chain, N/m: kg/m × g × (1 − ρwater / 7850), the
 * factor being 0.8694 in sea water (EN 1993-1-1 steel density; derived).
 */
export function submergedWeightNPerM(chainKgPerM: number, water: WaterType = 'sea'): number {
  const kg = requireNumber(chainKgPerM, 'chainKgPerM', 0, Infinity, 'min');
  const rho = water === 'fresh' ? FRESH_WATER_DENSITY_KGPM3 : SEA_WATER_DENSITY_KGPM3;
  return kg * STANDARD_GRAVITY_MPS2 * (1 - rho / STEEL_DENSITY_KGPM3);
}

/**
 * Chain length that must hang for it to meet the seabed tangentially, m:
 * s = √(h² + 2 h H / w) (MIT 2.019 Mooring Dynamics II, seen).
 */
export function suspendedLengthM(
  heightM: number,
  submergedNPerM: number,
  horizontalLoadN: number,
): number {
  return Math.sqrt(heightM * heightM + (2 * heightM * horizontalLoadN) / submergedNPerM);
}

interface Shape {
  suspendedChainM: number;
  /** Catenary parameters of the hanging chain: u at its lower and upper ends. */
  u0: number;
  u1: number;
}

const DEG = 180 / Math.PI;

/**
 * Root of an increasing f on [lo, hi] with f(lo) < 0 ≤ f(hi), by the Illinois variant of
 * false position (superlinear, never leaves the bracket). f is a height error in metres, so
 * it stops at |f| ≤ 1e-11 m or a bracket narrower than 1e-13 of its end (at most 100 steps).
 */
function solveIncreasing(f: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  let side = 0;
  let c = b;
  for (let i = 0; i < 100; i += 1) {
    c = (a * fb - b * fa) / (fb - fa);
    const fc = f(c);
    if (Math.abs(fc) <= 1e-11 || b - a <= 1e-13 * Math.max(1, Math.abs(b))) return c;
    if (fc > 0) {
      b = c;
      fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return c;
}

/** Solve the chain (+ weightless rope) shape for catenary parameter a = H / w. */
function solveShape(h: number, a: number, chainM: number, ropeM: number): Shape {
  if (ropeM === 0) {
    const s = Math.sqrt(h * h + 2 * h * a);
    if (chainM >= s) return { suspendedChainM: s, u0: 0, u1: Math.asinh(s / a) };
    const x = 2 * a * Math.asinh(Math.sqrt(chainM * chainM - h * h) / (2 * a));
    const mid = Math.atanh(h / chainM);
    return { suspendedChainM: chainM, u0: mid - x / (2 * a), u1: mid + x / (2 * a) };
  }
  // Touching the seabed: rise of the hanging chain plus the rope's rise along the chain's
  // end slope must equal h. Increasing in the hanging length s.
  const touching = (s: number): number => {
    const r = Math.sqrt(s * s + a * a);
    return r - a + (ropeM * s) / r - h;
  };
  if (touching(chainM) >= 0) {
    const s = solveIncreasing(touching, 0, chainM);
    return { suspendedChainM: s, u0: 0, u1: Math.asinh(s / a) };
  }
  // Whole chain hanging: the lower end lifts with slope sinh(u0). Increasing in u0.
  const lifted = (u0: number): number => {
    const u1 = Math.asinh(Math.sinh(u0) + chainM / a);
    return a * (Math.cosh(u1) - Math.cosh(u0)) + ropeM * Math.tanh(u1) - h;
  };
  let hi = 1;
  while (lifted(hi) < 0 && hi < 50) hi *= 2;
  const u0 = solveIncreasing(lifted, 0, hi);
  return { suspendedChainM: chainM, u0, u1: Math.asinh(Math.sinh(u0) + chainM / a) };
}

/**
 * Static shape and tensions of a chain rode (optionally with a weightless rope between bow
 * and chain) under horizontal load H, chain submerged weight w and height h (MIT 2.019,
 * seen): a = H / w; hanging length s = √(h² + 2 h a); reach x = a·asinh(s / a) + chain on the
 * seabed; bow tension T = H + w h. When the rode is shorter than s the chain lifts at the
 * anchor and the shape is solved with the anchor end inclined. Unrounded.
 */
export function catenary(input: CatenaryInput): CatenaryResult {
  const raw = requireObject(input, '');
  const depthM = requireNumber(raw.depthM, 'depthM', 0);
  const bowHeightM = requireNumber(raw.bowHeightM, 'bowHeightM', 0);
  const tideM = optionalNumber(raw.tideM, 'tideM', 0, 0);
  const water = requireOneOf(raw.water ?? 'sea', 'water', WATER_TYPES);
  const w = submergedWeightNPerM(raw.chainKgPerM as number, water);
  const load = requireNumber(raw.horizontalLoadN, 'horizontalLoadN', 0);
  const chainM = requireNumber(raw.chainLengthM, 'chainLengthM', 0, Infinity, 'min');
  const ropeM = optionalNumber(raw.ropeLengthM, 'ropeLengthM', 0, 0);
  const points = optionalNumber(raw.profilePoints, 'profilePoints', 50, 4, 400);
  const h = depthM + bowHeightM + tideM;
  if (h <= 0)
    throw new CalcInputError('depthM', 'depthM + bowHeightM + tideM must be greater than 0');
  if (chainM + ropeM <= h) {
    const field = ropeM > 0 ? 'ropeLengthM' : 'chainLengthM';
    throw new CalcInputError(
      field,
      `${field}: the rode must be longer than the height from seabed to bow (${h} m)`,
    );
  }
  const count = Math.floor(points);
  if (load === 0) return slack(h, w, chainM, ropeM);
  const a = load / w;
  const { suspendedChainM: s, u0, u1 } = solveShape(h, a, chainM, ropeM);
  const onBottomM = chainM - s;
  const chainReach = a * (u1 - u0);
  const ropeReach = ropeM / Math.cosh(u1);
  const reachM = onBottomM + chainReach + ropeReach;
  const profile = buildProfile(count, a, u0, u1, onBottomM, ropeM, reachM, h);
  const lifts = u0 > 1e-12;
  return {
    heightM: h,
    submergedNPerM: w,
    suspendedM: s + ropeM,
    onBottomM,
    reachM,
    bowTensionN: load * Math.cosh(u1),
    bowAngleDeg: Math.atan(Math.sinh(u1)) * DEG,
    anchorAngleDeg: Math.atan(Math.sinh(u0)) * DEG,
    liftsAtAnchor: lifts,
    profile,
    basis:
      'Static catenary of the chain (MIT 2.019 Mooring Dynamics II, seen): hanging length √(h² + 2hH/w), bow tension H + wh, ' +
      'chain weight reduced by buoyancy (0.8694 in sea water, derived)' +
      (ropeM > 0 ? '; the rope between bow and chain is treated as weightless and straight.' : '.'),
    cautions: catenaryCautions(lifts),
  };
}

function buildProfile(
  count: number,
  a: number,
  u0: number,
  u1: number,
  onBottomM: number,
  ropeM: number,
  reachM: number,
  h: number,
): Array<[number, number]> {
  const profile: Array<[number, number]> = [[0, 0]];
  const ropeEnd = ropeM > 0 ? 1 : 0;
  const curve = count - 1 - ropeEnd - (u0 === 0 ? 1 : 0);
  if (u0 === 0) profile.push([onBottomM, 0]);
  const coshU0 = Math.cosh(u0);
  for (let i = 1; i <= curve; i += 1) {
    const u = u0 + ((u1 - u0) * i) / curve;
    profile.push([onBottomM + a * (u - u0), a * (Math.cosh(u) - coshU0)]);
  }
  if (ropeEnd === 1) profile.push([reachM, h]);
  return profile;
}

function slack(h: number, w: number, chainM: number, ropeM: number): CatenaryResult {
  const onBottomM = chainM + ropeM - h;
  return {
    heightM: h,
    submergedNPerM: w,
    suspendedM: h,
    onBottomM,
    reachM: onBottomM,
    bowTensionN: w * Math.max(0, h - ropeM),
    bowAngleDeg: 90,
    anchorAngleDeg: 0,
    liftsAtAnchor: false,
    profile: [
      [0, 0],
      [onBottomM, 0],
      [onBottomM, h],
    ],
    basis:
      'No horizontal load: the rode hangs straight down from the bow and the rest lies on the seabed.',
    cautions: catenaryCautions(false),
  };
}

const STATIC_SHAPE =
  'This is a static shape: in gusts and waves the chain straightens and the shock reaches the anchor and the boat.';
const CATENARY_CAUTIONS = cautionList(STATIC_SHAPE);
const LIFTED_CAUTIONS = cautionList(
  STATIC_SHAPE,
  'Under this load the chain lifts at the anchor and pulls its shank up, which can break it out: let out more rode.',
);

function catenaryCautions(lifts: boolean): readonly string[] {
  return lifts ? LIFTED_CAUTIONS : CATENARY_CAUTIONS;
}
