// Whole recommendations against what practitioners carry, not only table lookups. Each case names its source:
// the Boat Mechanical Systems Handbook worked example (seen) or facts of the trade (common practice).
import { must } from '../testing/must';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { anchorMassForHoldingKg } from '../advice/anchor-holding';
import { tacklePlan } from '../plan/tackle-plan';
import { ropeSpec } from '../ratings/rope-spec';
import { chainSpec } from '../ratings/chain-spec';
import { ANCHOR_TYPES } from '../tables/anchor-holding';
import { ftToM, inToMm, kgToLb, lbfToN, lbToKg, N_PER_LBF } from '../units/units';
import { planComponentsFrom } from './plan-components';
import { recommendTackle, type RecommendTackleInput } from './recommend-tackle';

const lbOf = (kg: number | null) => kgToLb(kg ?? Number.NaN);
const rec = (patch: Partial<RecommendTackleInput>) =>
  recommendTackle({
    loaM: ftToM(35),
    hull: 'sail',
    windKn: 30,
    anchorType: 'plow',
    depthM: 5,
    tideM: 1,
    bowHeightM: 1.2,
    ...patch,
  });

describe('the handbook worked example', () => {
  // Boat Mechanical Systems Handbook (seen): 32 ft × 12 ft power boat of 21,000 lb → working anchor about 36 lb;
  // plow, claw, new-generation and high-tensile fluke equivalent there; a fisherman 1.5 × that; 5/16 in chain
  // meets the storm-anchor design load.
  const gerr = {
    loaM: ftToM(32),
    beamM: ftToM(12),
    hull: 'power' as const,
    displacementKg: lbToKg(21000),
  };

  it('gives a working plow of about 36 lb', () => {
    const r = rec({ ...gerr, anchorType: 'plow' });
    expect(lbOf(r.anchor.suggestedKg)).toBeGreaterThan(36 * 0.85);
    expect(lbOf(r.anchor.suggestedKg)).toBeLessThan(36 * 1.15);
  });

  it.each(['claw', 'scoop', 'fluke'] as const)(
    'gives a %s within a third of 36 lb',
    (anchorType) => {
      const kg = rec({ ...gerr, anchorType }).anchor.suggestedKg;
      expect(lbOf(kg)).toBeGreaterThan(24);
      expect(lbOf(kg)).toBeLessThan(48);
    },
  );

  it('gives a fisherman about 1.5 × the plow', () => {
    const plow = must(rec({ ...gerr, anchorType: 'plow' }).anchor.suggestedKg);
    const fisherman = must(rec({ ...gerr, anchorType: 'fisherman' }).anchor.suggestedKg);
    expect(fisherman / plow).toBeGreaterThan(1.35);
    expect(fisherman / plow).toBeLessThan(1.65);
  });

  it('carries the storm-anchor design load on 5/16 in chain', () => {
    const r = rec({ ...gerr, anchorType: 'plow' });
    expect(r.chain?.tradeSizeIn).toBe(5 / 16);
    // Storm anchor load: the 42 kn column of the 32.5 ft row, 1,600 lb (ABYC H-40, from memory).
    const g43 = chainSpec({ grade: 'G43', tradeSizeIn: 5 / 16 });
    expect(g43.wllN).toBeGreaterThan(r.sizingLoadN);
  });
});

describe('what cruisers carry', () => {
  // Common practice: a 9.1 m (30 ft) sloop carries about 25–35 lb working and roughly 45–65 lb for storms.
  const sloop = {
    loaM: 9.1,
    beamM: 3.2,
    hull: 'sail' as const,
    displacementKg: 4300,
    bowHeightM: 1.1,
  };

  it.each(['plow', 'scoop', 'claw'] as const)(
    'a 9.1 m sloop gets a %s of 25–38 lb for 30 kn',
    (anchorType) => {
      const lb = lbOf(rec({ ...sloop, anchorType }).anchor.suggestedKg);
      expect(lb).toBeGreaterThanOrEqual(25);
      expect(lb).toBeLessThanOrEqual(38);
    },
  );

  it('a 9.1 m sloop gets a storm anchor of about 45–72 lb for 60 kn, not hundreds', () => {
    for (const anchorType of ['plow', 'scoop'] as const) {
      const lb = lbOf(rec({ ...sloop, anchorType, windKn: 60 }).anchor.suggestedKg);
      expect(lb).toBeGreaterThanOrEqual(45);
      expect(lb).toBeLessThanOrEqual(72);
    }
  });

  // Common practice: about 1 lb of working plow per foot of boat.
  it.each([
    [25, 8.5],
    [30, 10],
    [35, 11],
    [40, 12],
    [45, 13.5],
  ])('about 1 lb of working plow per foot: %s ft × %s ft within ±40 %%', (loa, beam) => {
    const lb = lbOf(
      rec({ loaM: ftToM(loa), beamM: ftToM(beam), anchorType: 'plow' }).anchor.suggestedKg,
    );
    expect(lb / loa).toBeGreaterThan(0.6);
    expect(lb / loa).toBeLessThan(1.4);
  });

  // Common practice: on a 35–40 ft cruising sailboat 22 lb and 35 lb anchors serve as stern, kedge or secondary
  // anchors, so the main working anchor comes out heavier than 22 lb; a 105 lb anchor is a dedicated hurricane anchor.
  it('makes the main anchor of a 35–40 ft boat heavier than the 22 and 35 lb kedges and keeps hurricane anchors near 105 lb', () => {
    for (const [loa, beam] of [
      [36, 11.5],
      [38, 11.5],
      [40, 12],
    ]) {
      const boat = { loaM: ftToM(must(loa)), beamM: ftToM(must(beam)) };
      for (const anchorType of ['plow', 'scoop'] as const)
        expect(lbOf(rec({ ...boat, anchorType }).anchor.suggestedKg)).toBeGreaterThan(35);
      const hurricane = lbOf(rec({ ...boat, anchorType: 'plow', windKn: 70 }).anchor.suggestedKg);
      expect(hurricane).toBeGreaterThan(55);
      expect(hurricane).toBeLessThan(140);
    }
  });

  // Common practice: main rode 5/16 in high-test (G43, WLL about 4,000 lb) chain on a 35–40 ft boat.
  it('puts a 35–40 ft boat on 5/16 in G43 chain for everyday anchoring', () => {
    for (const [loa, beam] of [
      [35, 10],
      [38, 11.5],
      [40, 12],
    ]) {
      const r = rec({ loaM: ftToM(must(loa)), beamM: ftToM(must(beam)), windKn: 30 });
      expect(r.chain?.grade).toBe('G43');
      expect(r.chain?.tradeSizeIn).toBe(5 / 16);
      expect(must(r.chain).wllN).toBeGreaterThanOrEqual(r.sizingLoadN);
    }
  });

  // Common practice: no monohull up to 40 ft needs more than 3/8 in G43 for a 60–70 kn storm on a chain-and-nylon rode.
  it('keeps storm chain of 35–40 ft boats at 5/16–3/8 in, not 5/8 in', () => {
    for (const windKn of [60, 70]) {
      const r = rec({ loaM: ftToM(38), beamM: ftToM(11.5), windKn });
      expect(must(r.chain).tradeSizeIn).toBeLessThanOrEqual(3 / 8);
      expect(r.nylon?.role).toBe('storm-rode');
      expect(must(r.nylon).sizeIn).toBeGreaterThanOrEqual(5 / 8);
      expect(must(r.nylon).sizeIn).toBeLessThanOrEqual(7 / 8);
    }
  });

  // Common practice: the 55 lb scoop main anchor of a 35–40 ft sailboat is sized for storms up to 60–70 kn, on 5/16 in
  // G43 chain with a nylon snubber. Entered as a tackle plan it must not be flagged too light at 60 kn.
  it.each([
    [35, 10],
    [38, 11.5],
    [40, 11],
  ])(
    'a 55 lb scoop on 5/16 in G43 with a snubber is not too light at 60 kn (%s × %s ft)',
    (loa, beam) => {
      const r = tacklePlan({
        boat: { loaM: ftToM(loa), beamM: ftToM(beam), hull: 'sail', bowHeightM: 1.2 },
        windKn: 60,
        depthM: 5,
        tideM: 1,
        components: {
          anchor: { type: 'scoop', massKg: lbToKg(55) },
          chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 70 },
          snubber: { material: 'nylon', diameterMm: inToMm(5 / 8), lengthM: ftToM(loa) },
        },
      });
      expect(r.anchor?.meetsMinimum).toBe(true);
      expect(r.warnings.some((w) => /lighter than/.test(w))).toBe(false);
      expect(r.weakestLink?.ok).toBe(true);
    },
  );

  // Common practice: the hurricane rode is two 50 ft lengths of 3/8 in chain plus 150 ft of 3/4 in nylon, spliced
  // rather than shackled because 4,000 lb WLL shackles were the weakest link.
  it('finds the 4,000 lb shackle, not the rope, the weakest link of the hurricane rode', () => {
    const r = tacklePlan({
      boat: { loaM: ftToM(38), beamM: ftToM(11.5), hull: 'sail', bowHeightM: 1.2 },
      windKn: 60,
      depthM: 5,
      tideM: 1,
      components: {
        anchor: { type: 'plow', massKg: lbToKg(105) },
        chain: { grade: 'G43', tradeSizeIn: 3 / 8, lengthM: ftToM(100) },
        rode: {
          material: 'nylon',
          construction: 'three-strand',
          diameterMm: inToMm(3 / 4),
          lengthM: ftToM(150),
        },
        connectors: [
          {
            label: 'anchor shackle',
            kind: 'shackle',
            wllN: lbfToN(4000),
            minBreakN: lbfToN(20000),
          },
          { label: 'chain-to-rope splice', kind: 'splice' },
        ],
      },
    });
    expect(r.peakFactor).toBe(0.7);
    expect(r.weakestLink?.weakest.label).toBe('anchor shackle');
    expect(r.weakestLink?.byWll.map((m) => m.label)).toEqual([
      'anchor shackle',
      'chain-to-rope splice',
      'rope rode',
      'chain',
    ]);
    expect(r.anchor?.meetsMinimum).toBe(true);
    expect(r.warnings.some((w) => /anchor shackle: its WLL is below the chain/.test(w))).toBe(true);
    // The rope is rated for anchoring, not as cargo: within its limit, not "5× over".
    expect(must(r.rode).wllN).toBeGreaterThan(r.checkLoadN);
  });

  // The demo post: a 15 kg scoop on a 9.1 m sloop is a normal setup (common practice).
  it('does not flag a 15 kg scoop on a 9.1 m sloop at 35 kn', () => {
    const r = tacklePlan({
      boat: sloop,
      windKn: 35,
      depthM: 4,
      components: {
        anchor: { type: 'scoop', massKg: 15 },
        chain: { grade: 'G43', tradeSizeIn: 5 / 16, lengthM: 50 },
        snubber: { material: 'nylon', diameterMm: 14, lengthM: 7 },
      },
    });
    expect(r.anchor?.meetsMinimum).toBe(true);
    expect(r.anchor?.meetsSuggested).toBe(true);
    expect(r.warnings.some((w) => /lighter|squall/.test(w))).toBe(false);
  });

  // Practice: snubber the same line as the rode or one size up, and longer in storms.
  it('makes the snubber the same line as the nylon or one size up, and longer (not thicker) in storms', () => {
    for (const [loa, beam] of [
      [30, 10],
      [35, 11],
      [40, 12],
    ]) {
      const everyday = rec({ loaM: ftToM(must(loa)), beamM: ftToM(must(beam)) });
      const storm = rec({ loaM: ftToM(must(loa)), beamM: ftToM(must(beam)), windKn: 60 });
      const steps = [3 / 8, 7 / 16, 1 / 2, 9 / 16, 5 / 8, 3 / 4, 7 / 8, 1];
      const gap =
        steps.indexOf(everyday.snubber.sizeIn) - steps.indexOf(must(everyday.nylon).sizeIn);
      expect(gap).toBeGreaterThanOrEqual(0);
      expect(gap).toBeLessThanOrEqual(1);
      expect(storm.snubber.sizeIn).toBe(everyday.snubber.sizeIn);
      expect(storm.snubber.lengthM).toBeGreaterThanOrEqual(ftToM(must(loa)));
      expect(storm.snubber.lengthM).toBeGreaterThan(everyday.snubber.lengthM);
      expect(storm.snubber.bridle).toBe(true);
    }
  });

  it('keeps the everyday 5–7:1 plan free of the uplift warning and includes the tide in the rode', () => {
    const r = rec({ loaM: 9.1, beamM: 3.2, windKn: 30, depthM: 5, tideM: 2, bowHeightM: 1.1 });
    expect(must(r.catenary).anchorAngleDeg).toBeLessThanOrEqual(5);
    expect(r.warnings.some((w) => /upward/.test(w))).toBe(false);
    expect(r.scope.heightM).toBeCloseTo(8.1, 9);
    expect(r.scope.rodeLengthM).toBeGreaterThanOrEqual(r.scope.ratio * 8.1);
    expect(must(r.chain).lengthM).toBe(r.scope.rodeLengthM);
  });

  it('states its reasoning: the table row entered by beam, the holding curve and bottom, the factors', () => {
    const r = rec({ loaM: 9.1, beamM: 3.2 });
    const text = r.reasoning.map((s) => s.text).join(' ');
    expect(r.designLoad.governedBy).toBe('beam');
    expect(text).toMatch(/entered by beam/);
    expect(text).toMatch(/UFC 4-159-03 eq\. 26/);
    expect(text).toMatch(/firm mud or mixed/);
    expect(text).toMatch(/3 × the load/);
    expect(text).toMatch(/2\.25 × the load|0\.2 in \+ anchor lb ÷ 185/);
    expect(r.cautions.some((c) => /rigger or marine surveyor/.test(c))).toBe(true);
  });

  it('gives a caution, not a mass, on rock', () => {
    const r = rec({ bottom: 'rock' });
    expect(r.anchor.massKg).toBeNull();
    expect(r.warnings.some((w) => /rock/.test(w))).toBe(true);
  });

  it('uses the gypsy’s size when it carries the load and says so when it does not', () => {
    const fits = rec({ loaM: 11, gypsy: { grade: 'G43', tradeSizeIn: 3 / 8 } });
    expect(fits.chain?.tradeSizeIn).toBe(3 / 8);
    const small = rec({
      loaM: ftToM(40),
      beamM: ftToM(12),
      windKn: 70,
      gypsy: { grade: 'G30', tradeSizeIn: 1 / 4 },
    });
    expect(small.warnings.some((w) => /gypsy/.test(w))).toBe(true);
  });
});

describe('properties of the recommendation', () => {
  const real = (min: number, max: number) =>
    fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

  // b < 1 (UFC 4-159-03 eq. 26): anchor mass grows faster than the load it must hold.
  it('anchor mass grows faster than the load', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...ANCHOR_TYPES),
        fc.constantFrom('sand', 'mixed', 'mud', 'clay' as const),
        real(500, 40000),
        real(1.05, 4),
        (type, bottom, loadN, k) => {
          const a = anchorMassForHoldingKg(type, bottom, loadN);
          const b = anchorMassForHoldingKg(type, bottom, loadN * k);
          expect(b / a).toBeGreaterThan(k);
        },
      ),
    );
  });

  it('every output is monotonic in LOA, beam and wind', () => {
    fc.assert(
      fc.property(
        real(ftToM(12), ftToM(55)),
        real(0.5, 3),
        real(ftToM(4), ftToM(14)),
        real(0, 1.5),
        real(5, 85),
        real(0.5, 10),
        fc.constantFrom('sail', 'power' as const),
        fc.constantFrom(...ANCHOR_TYPES),
        (loa, dLoa, beam, dBeam, wind, dWind, hull, anchorType) => {
          const base = {
            loaM: loa,
            beamM: beam,
            hull,
            windKn: wind,
            anchorType,
            depthM: 5,
            extrapolate: true,
          };
          const bigger = [
            { ...base, loaM: Math.min(loa + dLoa, ftToM(60)) },
            { ...base, beamM: beam + dBeam },
            { ...base, windKn: Math.min(wind + dWind, 90) },
          ];
          const a = recommendTackle(base);
          for (const input of bigger) {
            const b = recommendTackle(input);
            expect(b.designLoad.loadN).toBeGreaterThanOrEqual(a.designLoad.loadN - 1e-9);
            expect(must(b.anchor.suggestedKg)).toBeGreaterThanOrEqual(
              must(a.anchor.suggestedKg) - 1e-9,
            );
            expect(must(b.anchor.minKg)).toBeGreaterThanOrEqual(must(a.anchor.minKg) - 1e-9);
            if (a.storm === b.storm) {
              if (a.chain && b.chain) expect(b.chain.wllN).toBeGreaterThanOrEqual(a.chain.wllN);
              if (a.nylon && b.nylon) expect(b.nylon.sizeIn).toBeGreaterThanOrEqual(a.nylon.sizeIn);
              expect(b.snubber.sizeIn).toBeGreaterThanOrEqual(a.snubber.sizeIn);
              expect(b.snubber.lengthM).toBeGreaterThanOrEqual(a.snubber.lengthM);
            }
          }
        },
      ),
      { numRuns: 300 },
    );
  });

  it('metric and imperial sizes are the same rope, and the metric pick is within one size', () => {
    fc.assert(
      fc.property(real(ftToM(15), ftToM(50)), real(5, 60), (loaM, windKn) => {
        const r = recommendTackle({ loaM, hull: 'sail', windKn, anchorType: 'plow', depthM: 5 });
        expect(r.snubber.diameterMm).toBeCloseTo(Math.round(r.snubber.sizeIn * 254) / 10, 9);
        const { nylon } = r;
        expect(must(nylon).sizeMm).toBeCloseTo(Math.round(must(nylon).sizeIn * 254) / 10, 9);
        const inRope = ropeSpec({
          material: 'nylon',
          construction: 'three-strand',
          diameterMm: inToMm(must(nylon).sizeIn),
          wet: true,
        });
        const mmRope = ropeSpec({
          material: 'nylon',
          construction: 'three-strand',
          diameterMm: must(nylon).metricMm,
          wet: true,
        });
        expect(mmRope.minBreakN).toBeGreaterThanOrEqual(r.rode.requiredRopeBreakN);
        expect(inRope.minBreakN).toBeGreaterThanOrEqual(r.rode.requiredRopeBreakN);
        expect(Math.abs(must(nylon).metricMm - must(nylon).sizeMm)).toBeLessThanOrEqual(3.2);
      }),
      { numRuns: 200 },
    );
  });

  it('design load in lbf matches the table through N_PER_LBF', () => {
    expect(rec({}).designLoad.loadN / N_PER_LBF).toBeCloseTo(900, 6); // ABYC H-40: 35 ft, 30 kn (from memory)
  });
});

describe('a saved plan carries what was recommended', () => {
  it('checks the recommended storm plan as passing, nylon included, with the shackle at least the chain', () => {
    for (const windKn of [30, 60, 70]) {
      const r = rec({ loaM: 9.1, beamM: 3.2, windKn, bowHeightM: 1.1 });
      const components = planComponentsFrom(r);
      expect(components.rode !== undefined).toBe(windKn > 42);
      const plan = tacklePlan({
        boat: { loaM: 9.1, beamM: 3.2, hull: 'sail', bowHeightM: 1.1 },
        windKn,
        depthM: 5,
        tideM: 1,
        components,
      });
      expect(plan.anchor?.meetsMinimum).toBe(true);
      expect(plan.weakestLink?.ok).toBe(true);
      expect(
        plan.warnings.some((w) => /lighter|below the chain|upward|thinner|short/.test(w)),
      ).toBe(false);
    }
  });
});
