import { STANDARD_GRAVITY_MPS2 } from '../constants';
import { requireNumber } from '../internal/validate';

/** Metres per foot, exact (international yard and pound agreement, 1959). */
export const M_PER_FT = 0.3048;
/** Millimetres per inch, exact (1959 agreement). */
export const MM_PER_IN = 25.4;
/** Kilograms per pound (avoirdupois), exact (1959 agreement). */
export const KG_PER_LB = 0.45359237;
/** Newtons per pound-force: 1 lb × standard gravity 9.80665 m/s², exact. */
export const N_PER_LBF = KG_PER_LB * STANDARD_GRAVITY_MPS2;
/** Metres per second per knot: 1852 m per hour ÷ 3600 s, exact. */
export const MPS_PER_KN = 1852 / 3600;
/** Pounds-force per short ton (2,000 lb), exact. */
export const LBF_PER_SHORT_TON = 2000;
/** Newtons per short ton-force: 2,000 lbf, exact. */
export const N_PER_SHORT_TON = LBF_PER_SHORT_TON * N_PER_LBF;

function finite(value: number, field: string): number {
  return requireNumber(value, field);
}

/** Feet to metres: m = ft × 0.3048 (exact). */
export function ftToM(ft: number): number {
  return finite(ft, 'ft') * M_PER_FT;
}
/** Metres to feet: ft = m ÷ 0.3048 (exact). */
export function mToFt(m: number): number {
  return finite(m, 'm') / M_PER_FT;
}
/** Inches to millimetres: mm = in × 25.4 (exact). */
export function inToMm(inches: number): number {
  return finite(inches, 'in') * MM_PER_IN;
}
/** Millimetres to inches: in = mm ÷ 25.4 (exact). */
export function mmToIn(mm: number): number {
  return finite(mm, 'mm') / MM_PER_IN;
}
/** Pounds (mass) to kilograms: kg = lb × 0.45359237 (exact). */
export function lbToKg(lb: number): number {
  return finite(lb, 'lb') * KG_PER_LB;
}
/** Kilograms to pounds (mass): lb = kg ÷ 0.45359237 (exact). */
export function kgToLb(kg: number): number {
  return finite(kg, 'kg') / KG_PER_LB;
}
/** Pounds-force to newtons: N = lbf × 4.4482216152605 (exact). */
export function lbfToN(lbf: number): number {
  return finite(lbf, 'lbf') * N_PER_LBF;
}
/** Newtons to pounds-force: lbf = N ÷ 4.4482216152605 (exact). */
export function nToLbf(n: number): number {
  return finite(n, 'N') / N_PER_LBF;
}
/** Knots to metres per second: m/s = kn × 1852 ÷ 3600 (exact). */
export function knToMps(kn: number): number {
  return finite(kn, 'kn') * MPS_PER_KN;
}
/** Metres per second to knots: kn = m/s × 3600 ÷ 1852 (exact). */
export function mpsToKn(mps: number): number {
  return finite(mps, 'mps') / MPS_PER_KN;
}
/** Short tons-force (2,000 lbf) to newtons: N = t × 8,896.443230521 (exact). */
export function shortTonToN(tons: number): number {
  return finite(tons, 'shortTon') * N_PER_SHORT_TON;
}
/** Newtons to short tons-force: t = N ÷ 8,896.443230521 (exact). */
export function nToShortTon(n: number): number {
  return finite(n, 'N') / N_PER_SHORT_TON;
}
/** Kilograms to newtons of weight under standard gravity: N = kg × 9.80665. */
export function kgToN(kg: number): number {
  return finite(kg, 'kg') * STANDARD_GRAVITY_MPS2;
}
/** Newtons of weight to kilograms under standard gravity: kg = N ÷ 9.80665. */
export function nToKg(n: number): number {
  return finite(n, 'N') / STANDARD_GRAVITY_MPS2;
}
