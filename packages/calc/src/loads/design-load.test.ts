import { describe, expect, it } from 'vitest';
import { thrownField } from '../testing/thrown-field';
import { ftToM, N_PER_LBF } from '../units/units';
import { designLoad } from './design-load';

// ABYC H-40 Table 1, horizontal design loads, lb (from memory, partly corroborated).
const ABYC_ROWS = [
  { loaFt: 10, beamSail: 4, beamPower: 5, kn15: 40, kn30: 160, kn42: 320 },
  { loaFt: 15, beamSail: 5, beamPower: 6, kn15: 60, kn30: 250, kn42: 500 },
  { loaFt: 20, beamSail: 7, beamPower: 8, kn15: 90, kn30: 360, kn42: 720 },
  { loaFt: 25, beamSail: 8, beamPower: 9, kn15: 125, kn30: 490, kn42: 980 },
  { loaFt: 30, beamSail: 9, beamPower: 11, kn15: 175, kn30: 700, kn42: 1400 },
  { loaFt: 35, beamSail: 10, beamPower: 13, kn15: 225, kn30: 900, kn42: 1800 },
  { loaFt: 40, beamSail: 11, beamPower: 14, kn15: 300, kn30: 1200, kn42: 2400 },
  { loaFt: 50, beamSail: 13, beamPower: 16, kn15: 400, kn30: 1600, kn42: 3200 },
  { loaFt: 60, beamSail: 15, beamPower: 18, kn15: 500, kn30: 2000, kn42: 4000 },
];

const lb = (loadN: number): number => loadN / N_PER_LBF;

describe('designLoad', () => {
  // ABYC H-40 Table 1 (from memory): every row and wind column, entered by LOA.
  it.each(ABYC_ROWS)('reproduces the $loaFt ft row at 15, 30 and 42 kn', (row) => {
    const loaM = ftToM(row.loaFt);
    for (const [windKn, expected] of [
      [15, row.kn15],
      [30, row.kn30],
      [42, row.kn42],
    ] as const) {
      const result = designLoad({ loaM, hull: 'sail', windKn });
      expect(lb(result.loadN)).toBeCloseTo(expected, 6);
      expect(result.rowLoaFt).toBeCloseTo(row.loaFt, 9);
      expect(result.extrapolated).toBe(false);
    }
  });

  // ABYC H-40 Table 1 (from memory): entering by beam lands on the same row.
  it.each(ABYC_ROWS)('enters the $loaFt ft row by sail and power beam', (row) => {
    const small = ftToM(10);
    const sail = designLoad({ loaM: small, beamM: ftToM(row.beamSail), hull: 'sail', windKn: 30 });
    const power = designLoad({
      loaM: small,
      beamM: ftToM(row.beamPower),
      hull: 'power',
      windKn: 30,
    });
    expect(lb(sail.loadN)).toBeCloseTo(row.kn30, 6);
    expect(lb(power.loadN)).toBeCloseTo(row.kn30, 6);
  });

  // Boat Mechanical Systems Handbook, worked example (seen): 32 ft power boat,
  // 12 ft beam → the 35 ft row → working load 900 lb (4.0 kN).
  it('matches the 32 ft / 12 ft beam worked example at the next row up', () => {
    const result = designLoad({
      loaM: ftToM(32),
      beamM: ftToM(12),
      hull: 'power',
      windKn: 30,
      rows: 'next-row-up',
    });
    expect(result.rowLoaFt).toBe(35);
    expect(lb(result.loadN)).toBeCloseTo(900, 6);
    expect(result.loadN / 1000).toBeCloseTo(4.0, 2);
  });

  // Same boat, interpolated (derived from the table): beam 12 ft lies halfway between the
  // 11 ft (30 ft row) and 13 ft (35 ft row) power beams → 32.5 ft row → 800 lb.
  it('interpolates the worked example between rows and lets beam govern', () => {
    const result = designLoad({ loaM: ftToM(32), beamM: ftToM(12), hull: 'power', windKn: 30 });
    expect(result.governedBy).toBe('beam');
    expect(result.rowLoaFt).toBeCloseTo(32.5, 9);
    expect(lb(result.loadN)).toBeCloseTo(800, 6);
  });

  it('lets LOA govern when the beam is narrow', () => {
    const result = designLoad({ loaM: ftToM(40), beamM: ftToM(9), hull: 'sail', windKn: 30 });
    expect(result.governedBy).toBe('loa');
    expect(lb(result.loadN)).toBeCloseTo(1200, 6);
  });

  // The table's own relation (derived): loads scale with wind speed squared.
  it('scales with wind speed squared beyond 42 kn and flags it', () => {
    const at42 = designLoad({ loaM: ftToM(35), hull: 'sail', windKn: 42 });
    const at60 = designLoad({ loaM: ftToM(35), hull: 'sail', windKn: 60 });
    expect(at60.loadN / at42.loadN).toBeCloseTo((60 / 42) ** 2, 9);
    expect(at60.extrapolated).toBe(true);
    expect(at60.approximate).toBe(true);
    expect(at42.extrapolated).toBe(false);
  });

  it('scales with V² between the columns and below 15 kn', () => {
    const at15 = designLoad({ loaM: ftToM(30), hull: 'sail', windKn: 15 });
    const at10 = designLoad({ loaM: ftToM(30), hull: 'sail', windKn: 10 });
    const at20 = designLoad({ loaM: ftToM(30), hull: 'sail', windKn: 20 });
    expect(at10.loadN / at15.loadN).toBeCloseTo((10 / 15) ** 2, 9);
    // 30 kn column = 4 × 15 kn column in this row, so V² holds between them too.
    expect(at20.loadN / at15.loadN).toBeCloseTo((20 / 15) ** 2, 9);
    expect(designLoad({ loaM: ftToM(30), hull: 'sail', windKn: 0 }).loadN).toBe(0);
  });

  // Our multihull rule (common practice, approximate): sailboat row by LOA × 1.5.
  it('applies the multihull rule and flags it approximate', () => {
    const mono = designLoad({ loaM: ftToM(40), hull: 'sail', windKn: 30 });
    const multi = designLoad({ loaM: ftToM(40), beamM: ftToM(22), hull: 'multihull', windKn: 30 });
    expect(multi.loadN).toBeCloseTo(mono.loadN * 1.5, 9);
    expect(multi.approximate).toBe(true);
    expect(multi.governedBy).toBe('loa');
    expect(multi.basis).toMatch(/multihull/);
  });

  it('requires the extrapolate flag beyond the table', () => {
    expect(() => designLoad({ loaM: ftToM(70), hull: 'sail', windKn: 30 })).toThrow(RangeError);
    const big = designLoad({ loaM: ftToM(70), hull: 'sail', windKn: 30, extrapolate: true });
    expect(big.extrapolated).toBe(true);
    expect(lb(big.loadN)).toBeCloseTo(2400, 6); // last segment extended: +400 lb per 10 ft
    expect(() =>
      designLoad({ loaM: ftToM(40), beamM: ftToM(20), hull: 'power', windKn: 30 }),
    ).toThrow(/beamM/);
  });

  it.each([
    [{ loaM: -1, hull: 'sail', windKn: 30 }, 'loaM'],
    [{ loaM: Number.NaN, hull: 'sail', windKn: 30 }, 'loaM'],
    [{ loaM: 10, hull: 'sail', windKn: -5 }, 'windKn'],
    [{ loaM: 10, hull: 'sail', windKn: 150 }, 'windKn'],
    [{ loaM: 10, hull: 'canoe', windKn: 30 }, 'hull'],
    [{ loaM: 10, beamM: -3, hull: 'sail', windKn: 30 }, 'beamM'],
  ])('rejects %o naming %s', (input, field) => {
    expect(thrownField(() => designLoad(input as Parameters<typeof designLoad>[0]))).toBe(field);
  });

  it('carries a basis and cautions', () => {
    const result = designLoad({ loaM: 10, hull: 'sail', windKn: 30 });
    expect(result.basis).toMatch(/ABYC H-40/);
    expect(result.cautions.length).toBeGreaterThan(3);
  });
});
