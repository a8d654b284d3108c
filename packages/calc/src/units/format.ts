import { CalcInputError } from '../errors';
import { requireNumber, requireOneOf } from '../internal/validate';
import { KG_PER_LB, M_PER_FT, MM_PER_IN, N_PER_LBF } from './units';

/** The two display systems a member can choose. */
export type UnitSystem = 'imperial' | 'metric';
/** Every display system, for pickers. */
export const UNIT_SYSTEMS: readonly UnitSystem[] = ['imperial', 'metric'];

/** Display options shared by the formatters. */
export interface FormatOptions {
  /** Digits after the decimal point; default depends on the quantity. */
  fractionDigits?: number;
}

/** Options for {@link formatLength}. */
export interface FormatLengthOptions extends FormatOptions {
  /** Show a small length (a diameter) in mm or inches instead of m or ft. */
  small?: boolean;
}

const formatters = new Map<number, Intl.NumberFormat>();

function numberText(value: number, fractionDigits: number): string {
  let formatter = formatters.get(fractionDigits);
  if (formatter === undefined) {
    formatter = new Intl.NumberFormat('en-US', {
      minimumFractionDigits: fractionDigits,
      maximumFractionDigits: fractionDigits,
    });
    formatters.set(fractionDigits, formatter);
  }
  return formatter.format(value);
}

function digits(options: FormatOptions | undefined, fallback: number): number {
  if (options?.fractionDigits === undefined) return fallback;
  const value = requireNumber(options.fractionDigits, 'fractionDigits', 0, 6);
  if (!Number.isInteger(value)) {
    throw new CalcInputError('fractionDigits', 'fractionDigits must be a whole number');
  }
  return value;
}

/**
 * A length given in metres, as display text: metres or feet (mm or inches when `small`).
 * Rounds for display only, e.g. `formatLength(10, 'imperial')` → "32.8 ft".
 */
export function formatLength(
  valueM: number,
  system: UnitSystem,
  options?: FormatLengthOptions,
): string {
  const m = requireNumber(valueM, 'value');
  const sys = requireOneOf(system, 'system', UNIT_SYSTEMS);
  if (options?.small === true) {
    return sys === 'metric'
      ? `${numberText(m * 1000, digits(options, 0))} mm`
      : `${numberText((m * 1000) / MM_PER_IN, digits(options, 2))} in`;
  }
  return sys === 'metric'
    ? `${numberText(m, digits(options, 1))} m`
    : `${numberText(m / M_PER_FT, digits(options, 1))} ft`;
}

/** A mass given in kilograms, as display text in kg or lb, e.g. "16.0 kg" / "35.3 lb". */
export function formatMass(valueKg: number, system: UnitSystem, options?: FormatOptions): string {
  const kg = requireNumber(valueKg, 'value');
  const sys = requireOneOf(system, 'system', UNIT_SYSTEMS);
  return sys === 'metric'
    ? `${numberText(kg, digits(options, 1))} kg`
    : `${numberText(kg / KG_PER_LB, digits(options, 1))} lb`;
}

/** A force given in newtons, as display text in kN or lbf, e.g. "4.00 kN" / "900 lbf". */
export function formatForce(valueN: number, system: UnitSystem, options?: FormatOptions): string {
  const n = requireNumber(valueN, 'value');
  const sys = requireOneOf(system, 'system', UNIT_SYSTEMS);
  return sys === 'metric'
    ? `${numberText(n / 1000, digits(options, 2))} kN`
    : `${numberText(n / N_PER_LBF, digits(options, 0))} lbf`;
}

/**
 * A size in inches as a trade fraction to the nearest 1/16 in, e.g. 0.3125 → "5/16 in",
 * 1.125 → "1 1/8 in". For labels of chain, shackle and rope sizes.
 */
export function inchFractionLabel(valueIn: number): string {
  const inches = requireNumber(valueIn, 'valueIn', 0);
  const sixteenths = Math.round(inches * 16);
  const whole = Math.floor(sixteenths / 16);
  let numerator = sixteenths % 16;
  let denominator = 16;
  while (numerator !== 0 && numerator % 2 === 0) {
    numerator /= 2;
    denominator /= 2;
  }
  if (numerator === 0) return `${whole} in`;
  return whole === 0 ? `${numerator}/${denominator} in` : `${whole} ${numerator}/${denominator} in`;
}

/** A trade size in inches as millimetres to one decimal, the same rope or chain: 3/4 in → 19.1 mm. */
export function tradeSizeMm(sizeIn: number): number {
  return Math.round(sizeIn * 254 + 1e-6) / 10;
}
