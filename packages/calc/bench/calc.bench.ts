import { bench, describe } from 'vitest';
import {
  anchorSuggestion,
  catenary,
  chainSpec,
  chainSpecMetric,
  designLoad,
  formatForce,
  ftToM,
  rodeSuggestion,
  ropeSpec,
  scope,
  scopeRatio,
  shackleSpec,
  snubberSuggestion,
  swingRadius,
  tacklePlan,
  weakestLink,
  type TacklePlanInput,
} from '../src/index';

// Time per call for each export; the UI recomputes on every keystroke (target < 50 µs).
const loaM = ftToM(35);
const chainInput = {
  depthM: 8,
  bowHeightM: 1.2,
  tideM: 1.5,
  chainKgPerM: 1.6,
  horizontalLoadN: 4000,
};
const plan: TacklePlanInput = {
  boat: { loaM, beamM: ftToM(11), hull: 'sail', bowHeightM: 1.2, displacementKg: 7000 },
  windKn: 30,
  depthM: 8,
  tideM: 1.5,
  components: {
    anchor: { type: 'scoop', massKg: 20 },
    chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 20 },
    rode: { material: 'nylon', construction: 'three-strand', diameterMm: 16, lengthM: 40 },
    snubber: { material: 'nylon', diameterMm: 14, lengthM: 6 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 1 / 2 }],
  },
};

describe('calc per call', () => {
  bench('designLoad', () => {
    designLoad({ loaM, beamM: ftToM(12), hull: 'power', windKn: 30 });
  });
  bench('chainSpec', () => {
    chainSpec({ grade: 'G43', tradeSizeIn: 5 / 16 });
  });
  bench('chainSpecMetric', () => {
    chainSpecMetric({ grade: 'G70', nominalMm: 10 });
  });
  bench('shackleSpec', () => {
    shackleSpec({ nominalIn: 1 / 2 });
  });
  bench('ropeSpec', () => {
    ropeSpec({ material: 'nylon', construction: 'double-braid', diameterMm: 14, wet: true });
  });
  bench('catenary (all chain, 50 points)', () => {
    catenary({ ...chainInput, chainLengthM: 60 });
  });
  bench('catenary (lifted at the anchor)', () => {
    catenary({ ...chainInput, horizontalLoadN: 12000, chainLengthM: 25 });
  });
  bench('catenary (chain + rope)', () => {
    catenary({ ...chainInput, chainLengthM: 20, ropeLengthM: 40 });
  });
  bench('scope', () => {
    scope({ depthM: 8, bowHeightM: 1.2, tideM: 1.5, ratio: 7 });
  });
  bench('scopeRatio', () => {
    scopeRatio({ rodeM: 60, depthM: 8, bowHeightM: 1.2, tideM: 1.5 });
  });
  bench('swingRadius', () => {
    swingRadius({ rodeM: 60, depthM: 8, bowHeightM: 1.2, loaM });
  });
  bench('weakestLink', () => {
    weakestLink({
      loadN: 4000,
      components: [
        { label: 'chain', wllN: 17348, minBreakN: 52044 },
        { label: 'shackle', wllN: 17793, minBreakN: 88964 },
        { label: 'splice', wllN: 3800, minBreakN: 30000 },
      ],
    });
  });
  bench('anchorSuggestion', () => {
    anchorSuggestion({ loaM, hull: 'sail', windKn: 30, anchorType: 'plow', bottom: 'sand' });
  });
  bench('rodeSuggestion', () => {
    rodeSuggestion({ loadN: 8000, anchorKg: 16 });
  });
  bench('snubberSuggestion', () => {
    snubberSuggestion({ loadN: 8000 });
  });
  bench('formatForce', () => {
    formatForce(4003.4, 'imperial');
  });
  bench('tacklePlan (everything)', () => {
    tacklePlan(plan);
  });
});
