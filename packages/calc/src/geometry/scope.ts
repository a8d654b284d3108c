import { CalcInputError } from '../errors';
import { optionalNumber, requireNumber, requireObject } from '../internal/validate';

/** Input of {@link scope}. */
export interface ScopeInput {
  depthM: number;
  bowHeightM: number;
  /** Tidal rise still to come, m (default 0). */
  tideM?: number;
  /** Scope ratio, rode ÷ height, ≥ 1. */
  ratio: number;
}

/** Result of {@link scope}. */
export interface ScopeResult {
  rodeM: number;
  /** Height from seabed to bow at high water, m. */
  heightM: number;
  basis: string;
}

/** Input of {@link scopeRatio}. */
export interface ScopeRatioInput {
  rodeM: number;
  depthM: number;
  bowHeightM: number;
  tideM?: number;
}

/** One rung of the scope ladder. */
export interface ScopeRung {
  ratio: number;
  label: string;
}

/** Scope ladder (Boat Mechanical Systems Handbook, seen): 3:1 bare minimum in light weather … 10:1 severe. */
export const SCOPE_LADDER: readonly ScopeRung[] = [
  { ratio: 3, label: 'bare minimum, light weather' },
  { ratio: 5, label: 'most weather' },
  { ratio: 7, label: 'storms or poor holding' },
  { ratio: 10, label: 'severe weather' },
];

function height(raw: Record<string, unknown>): number {
  const depthM = requireNumber(raw.depthM, 'depthM', 0);
  const bowHeightM = requireNumber(raw.bowHeightM, 'bowHeightM', 0);
  const tideM = optionalNumber(raw.tideM, 'tideM', 0, 0);
  const h = depthM + bowHeightM + tideM;
  if (h <= 0)
    throw new CalcInputError('depthM', 'depthM + bowHeightM + tideM must be greater than 0');
  return h;
}

/**
 * Rode to let out for a scope ratio, m: rode = ratio × (depth + bow height + tidal rise)
 * (keelboat sailing-course textbook on scope, seen). Unrounded.
 */
export function scope(input: ScopeInput): ScopeResult {
  const raw = requireObject(input, '');
  const ratio = requireNumber(raw.ratio, 'ratio', 1, 50);
  const h = height(raw);
  return {
    rodeM: ratio * h,
    heightM: h,
    basis: `Rode = ${ratio} × (depth + bow-roller height + tidal rise); forgetting the tide and the freeboard shortens the real scope.`,
  };
}

/** Scope ratio of a rode: rode ÷ (depth + bow height + tidal rise), dimensionless. */
export function scopeRatio(input: ScopeRatioInput): number {
  const raw = requireObject(input, '');
  const rodeM = requireNumber(raw.rodeM, 'rodeM', 0);
  return rodeM / height(raw);
}

/** The highest rung of {@link SCOPE_LADDER} a ratio reaches, or `undefined` below 3:1. */
export function scopeRung(ratio: number): ScopeRung | undefined {
  let found: ScopeRung | undefined;
  for (const rung of SCOPE_LADDER) if (ratio >= rung.ratio) found = rung;
  return found;
}
