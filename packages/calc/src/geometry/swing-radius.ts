import { CalcInputError } from '../errors';
import { optionalNumber, requireNumber, requireObject } from '../internal/validate';

/** Input of {@link swingRadius}. */
export interface SwingRadiusInput {
  rodeM: number;
  depthM: number;
  bowHeightM: number;
  /** Tidal rise, m (default 0): the circle is widest at low water, so pass 0 for the worst case. */
  tideM?: number;
  loaM: number;
}

/** Result of {@link swingRadius}. */
export interface SwingRadiusResult {
  radiusM: number;
  basis: string;
}

/**
 * Radius of the circle the boat can swing through, m: LOA + √(rode² − h²) with h = depth +
 * bow height + tide (nautical-training practice, seen). Throws when the rode is shorter than h.
 */
export function swingRadius(input: SwingRadiusInput): SwingRadiusResult {
  const raw = requireObject(input, '');
  const rodeM = requireNumber(raw.rodeM, 'rodeM', 0);
  const depthM = requireNumber(raw.depthM, 'depthM', 0);
  const bowHeightM = requireNumber(raw.bowHeightM, 'bowHeightM', 0);
  const tideM = optionalNumber(raw.tideM, 'tideM', 0, 0);
  const loaM = requireNumber(raw.loaM, 'loaM', 0, Infinity, 'min');
  const h = depthM + bowHeightM + tideM;
  if (rodeM < h) {
    throw new CalcInputError(
      'rodeM',
      `rodeM must be at least the height from seabed to bow (${h} m)`,
    );
  }
  return {
    radiusM: loaM + Math.sqrt(rodeM * rodeM - h * h),
    basis:
      'Swing radius = LOA + √(rode² − (depth + freeboard + tide)²) (nautical-training practice); the rode is taken as straight, so the true circle is a little smaller.',
  };
}
