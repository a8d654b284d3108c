import {
  KG_PER_LB,
  M_PER_FT,
  MM_PER_IN,
  MPS_PER_KN,
  N_PER_LBF,
  formatForce,
  formatLength,
  formatMass,
  inchFractionLabel,
  type UnitSystem,
} from '@app/calc';
import type { QuantityKind } from './parse-quantity';

/** A trade fraction ("5/16 in") when the size is within 0.005 in of a sixteenth, else decimal inches. */
function inchText(valueM: number): string {
  const inches = (valueM * 1000) / MM_PER_IN;
  const nearSixteenth = Math.abs(Math.round(inches * 16) / 16 - inches) < 0.005;
  return inches > 0 && nearSixteenth ? inchFractionLabel(inches) : `${plain(inches, 3)} in`;
}

const plain = (value: number, digits: number) =>
  new Intl.NumberFormat('en-US', { maximumFractionDigits: digits, useGrouping: false }).format(
    value,
  );

/**
 * A value in its kind's base unit (m, kg, N, kn; see `QuantityKind`) as display text in `system`,
 * e.g. `formatQuantity(9.75, 'length', 'imperial')` → "32.0 ft". Diameters show mm or inches with
 * the trade fraction ("5/16 in"); speeds show knots in both systems, with m/s as the metric aside.
 */
export function formatQuantity(value: number, kind: QuantityKind, system: UnitSystem): string {
  switch (kind) {
    case 'length':
      return formatLength(value, system);
    case 'diameter': {
      if (system === 'metric')
        return formatLength(value, system, { small: true, fractionDigits: 1 });
      return inchText(value);
    }
    case 'mass':
      return formatMass(value, system);
    case 'force':
      return formatForce(value, system);
    case 'speed':
      return system === 'metric'
        ? `${plain(value, 1)} kn (${plain(value * MPS_PER_KN, 1)} m/s)`
        : `${plain(value, 1)} kn`;
  }
}

/** The other display system. */
export const otherSystem = (system: UnitSystem): UnitSystem =>
  system === 'metric' ? 'imperial' : 'metric';

/**
 * A value as an editable field text in `system`, with its unit, e.g. "32.81 ft" or "9.75 m"; the
 * inverse of `parseQuantity` up to rounding.
 */
export function quantityInputText(value: number, kind: QuantityKind, system: UnitSystem): string {
  const metric = system === 'metric';
  switch (kind) {
    case 'length':
      return metric ? `${plain(value, 2)} m` : `${plain(value / M_PER_FT, 2)} ft`;
    case 'diameter': {
      if (metric) return `${plain(value * 1000, 1)} mm`;
      return inchText(value);
    }
    case 'mass':
      return metric ? `${plain(value, 1)} kg` : `${plain(value / KG_PER_LB, 1)} lb`;
    case 'force':
      return metric ? `${plain(value / 1000, 2)} kN` : `${plain(value / N_PER_LBF, 0)} lbf`;
    case 'speed':
      return `${plain(value, 1)} kn`;
  }
}
