import { formatForce, formatLength, formatMass } from './format';
import {
  ftToM,
  inToMm,
  kgToLb,
  kgToN,
  knToMps,
  lbToKg,
  lbfToN,
  mmToIn,
  mpsToKn,
  mToFt,
  nToKg,
  nToLbf,
  nToShortTon,
  shortTonToN,
} from './units';

/**
 * Exact unit conversions (1959 international foot and pound, standard gravity, 1852 m
 * nautical mile) and display formatters, grouped for `units.ftToM(…)` style calls.
 */
export const units = {
  ftToM,
  mToFt,
  inToMm,
  mmToIn,
  lbToKg,
  kgToLb,
  lbfToN,
  nToLbf,
  knToMps,
  mpsToKn,
  shortTonToN,
  nToShortTon,
  kgToN,
  nToKg,
  formatLength,
  formatMass,
  formatForce,
} as const;
