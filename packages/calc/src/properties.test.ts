import { must } from './testing/must';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { anchorSuggestion } from './advice/anchor-suggestion';
import { rodeSuggestion } from './advice/rode-suggestion';
import { snubberSuggestion } from './advice/snubber-suggestion';
import { catenary } from './geometry/catenary';
import { scope, scopeRatio } from './geometry/scope';
import { swingRadius } from './geometry/swing-radius';
import { designLoad } from './loads/design-load';
import { ropeSpec } from './ratings/rope-spec';
import { tacklePlan } from './plan/tackle-plan';
import { HULL_TYPES } from './tables/abyc-h40';
import { ANCHOR_TYPES, BOTTOM_TYPES } from './tables/anchor-holding';
import {
  ftToM,
  inToMm,
  kgToLb,
  knToMps,
  lbToKg,
  lbfToN,
  mmToIn,
  mpsToKn,
  mToFt,
  nToLbf,
  nToShortTon,
  shortTonToN,
} from './units/units';

const real = (min: number, max: number) =>
  fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const hull = fc.constantFrom(...HULL_TYPES);
const loaM = real(ftToM(10), ftToM(60));
const isFiniteDeep = (value: unknown): boolean => {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(isFiniteDeep);
  if (typeof value === 'object' && value !== null) return Object.values(value).every(isFiniteDeep);
  return true;
};

describe('properties', () => {
  it('conversions invert', () => {
    const pairs = [
      [ftToM, mToFt],
      [inToMm, mmToIn],
      [lbToKg, kgToLb],
      [lbfToN, nToLbf],
      [knToMps, mpsToKn],
      [shortTonToN, nToShortTon],
    ] as const;
    fc.assert(
      fc.property(real(-1e6, 1e6), (x) => {
        for (const [to, back] of pairs) {
          expect(back(to(x))).toBeCloseTo(x, 6);
          expect(to(back(x))).toBeCloseTo(x, 6);
        }
      }),
    );
  });

  it('designLoad grows with wind', () => {
    fc.assert(
      fc.property(loaM, hull, real(0, 99), real(0.01, 1), (loa, h, v, dv) => {
        const a = designLoad({ loaM: loa, hull: h, windKn: v }).loadN;
        const b = designLoad({ loaM: loa, hull: h, windKn: v + dv }).loadN;
        expect(b).toBeGreaterThan(a);
      }),
    );
  });

  it('designLoad never falls with length or beam', () => {
    fc.assert(
      fc.property(
        real(ftToM(10), ftToM(59)),
        real(0.01, 0.3),
        fc.constantFrom('sail', 'power'),
        (loa, d, h) => {
          const a = designLoad({ loaM: loa, hull: h, windKn: 30 }).loadN;
          const b = designLoad({ loaM: loa + d, hull: h, windKn: 30 }).loadN;
          const c = designLoad({ loaM: loa, beamM: ftToM(15), hull: h, windKn: 30 }).loadN;
          expect(b).toBeGreaterThanOrEqual(a);
          expect(c).toBeGreaterThanOrEqual(a);
        },
      ),
    );
  });

  // Chain long enough to touch down, so the hanging length is free to grow.
  const chainCase = fc.record({
    depthM: real(1, 40),
    bowHeightM: real(0, 3),
    chainKgPerM: real(0.5, 10),
    horizontalLoadN: real(10, 50000),
  });

  it('catenary suspended length grows with load and depth', () => {
    fc.assert(
      fc.property(chainCase, real(1.01, 2), real(0.1, 5), (c, k, dd) => {
        const chainLengthM = 5000;
        const base = catenary({ ...c, chainLengthM }).suspendedM;
        expect(
          catenary({ ...c, horizontalLoadN: c.horizontalLoadN * k, chainLengthM }).suspendedM,
        ).toBeGreaterThan(base);
        expect(catenary({ ...c, depthM: c.depthM + dd, chainLengthM }).suspendedM).toBeGreaterThan(
          base,
        );
      }),
    );
  });

  it('catenary bow tension is at least the horizontal load plus the chain weight lifted', () => {
    fc.assert(
      fc.property(chainCase, real(1.05, 20), real(0, 100), (c, lengthFactor, ropeM) => {
        const h = c.depthM + c.bowHeightM;
        const r = catenary({ ...c, chainLengthM: h * lengthFactor, ropeLengthM: ropeM });
        expect(r.bowTensionN).toBeGreaterThanOrEqual(c.horizontalLoadN * (1 - 1e-12));
        expect(r.onBottomM).toBeGreaterThanOrEqual(-1e-9);
        const bow = r.profile.at(-1) ?? [0, 0];
        expect(bow[1]).toBeCloseTo(h, 6);
        expect(bow[0]).toBeCloseTo(r.reachM, 6);
      }),
    );
  });

  it('scope and scopeRatio invert', () => {
    fc.assert(
      fc.property(
        real(0.5, 50),
        real(0, 3),
        real(0, 5),
        real(1, 15),
        (depthM, bowHeightM, tideM, ratio) => {
          const { rodeM } = scope({ depthM, bowHeightM, tideM, ratio });
          expect(scopeRatio({ rodeM, depthM, bowHeightM, tideM })).toBeCloseTo(ratio, 9);
        },
      ),
    );
  });

  it('anchorSuggestion is monotonic in load', () => {
    fc.assert(
      fc.property(
        loaM,
        hull,
        real(5, 90),
        real(0.1, 10),
        fc.constantFrom(...ANCHOR_TYPES),
        fc.constantFrom(...BOTTOM_TYPES),
        (loa, h, v, dv, anchorType, bottom) => {
          const a = anchorSuggestion({ loaM: loa, hull: h, windKn: v, anchorType, bottom });
          const b = anchorSuggestion({ loaM: loa, hull: h, windKn: v + dv, anchorType, bottom });
          expect(b.loadN).toBeGreaterThan(a.loadN);
          if (a.minKg === null || b.minKg === null) {
            expect(['rock', 'weed']).toContain(bottom);
            return;
          }
          expect(b.minKg).toBeGreaterThan(a.minKg);
          expect(must(b.suggestedKg)).toBeGreaterThanOrEqual(must(a.suggestedKg));
        },
      ),
    );
  });

  it('no function returns NaN or Infinity for valid input', () => {
    fc.assert(
      fc.property(
        loaM,
        hull,
        real(1, 90),
        real(1, 30),
        real(0, 3),
        real(9.5, 25.5),
        fc.constantFrom(...ANCHOR_TYPES),
        (loa, h, windKn, depthM, bowHeightM, diameterMm, anchorType) => {
          const load = designLoad({ loaM: loa, hull: h, windKn });
          const results: unknown[] = [
            load,
            ropeSpec({ material: 'nylon', construction: 'double-braid', diameterMm, wet: true }),
            anchorSuggestion({ loaM: loa, hull: h, windKn, anchorType }),
            rodeSuggestion({ loadN: load.loadN, anchorKg: 15 }),
            snubberSuggestion({ loadN: load.loadN }),
            swingRadius({ rodeM: (depthM + bowHeightM) * 5, depthM, bowHeightM, loaM: loa }),
            tacklePlan({
              boat: { loaM: loa, hull: h, bowHeightM },
              windKn,
              depthM,
              components: {
                anchor: { type: anchorType, massKg: 15 },
                chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 15 },
                rode: {
                  material: 'nylon',
                  construction: 'three-strand',
                  diameterMm,
                  lengthM: depthM * 6,
                },
                connectors: [{ label: 'shackle', kind: 'shackle', nominalIn: 0.5 }],
              },
            }),
          ];
          for (const result of results) expect(isFiniteDeep(result)).toBe(true);
        },
      ),
    );
  });
});
