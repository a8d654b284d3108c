/** Welded steel chain grades of 49 CFR 393.108 and NACM. */
export type ChainGrade = 'G30' | 'G43' | 'G70' | 'G80' | 'G100';

/** Every chain grade, weakest first. */
export const CHAIN_GRADES: readonly ChainGrade[] = ['G30', 'G43', 'G70', 'G80', 'G100'];

/** Trade names of the grades as 49 CFR 393.108 prints them. */
export const CHAIN_GRADE_LABELS: Readonly<Record<ChainGrade, string>> = {
  G30: 'Grade 30 proof coil',
  G43: 'Grade 43 high test',
  G70: 'Grade 70 transport',
  G80: 'Grade 80 alloy',
  G100: 'Grade 100 alloy',
};

/** One row of the chain table. */
export interface ChainRow {
  tradeSizeIn: number;
  /** Material diameter printed beside the trade size, mm. */
  materialMm: number;
  /** Working load limit per grade, lb; `undefined` where the table has no entry. */
  wllLb: Readonly<Record<ChainGrade, number | undefined>>;
  /** Mass per metre, kg/m (see CHAIN_MASS_NOTE for its certainty). */
  kgPerM: number;
  /** Certainty of `kgPerM`. */
  massMark: 'from memory' | 'derived';
}

/**
 * 49 CFR 393.108 chain table, WLL in lb (seen); the same as NACM for G30/G43/G70 (from
 * memory). Not monotonic in grade at 5/16 in (G80 < G70): the table is kept as printed.
 * Masses: 1/4, 5/16, 3/8, 1/2 in from memory (±10 %); 7/16 and 5/8 in derived as
 * 0.0235 kg/m per mm² of material diameter, fitted to those four (±10 %).
 */
export const CHAIN_ROWS: readonly ChainRow[] = [
  {
    tradeSizeIn: 1 / 4,
    materialMm: 7,
    wllLb: { G30: 1300, G43: 2600, G70: 3150, G80: 3500, G100: 4300 },
    kgPerM: 1.15,
    massMark: 'from memory',
  },
  {
    tradeSizeIn: 5 / 16,
    materialMm: 8,
    wllLb: { G30: 1900, G43: 3900, G70: 4700, G80: 4500, G100: 5700 },
    kgPerM: 1.6,
    massMark: 'from memory',
  },
  {
    tradeSizeIn: 3 / 8,
    materialMm: 10,
    wllLb: { G30: 2650, G43: 5400, G70: 6600, G80: 7100, G100: 8800 },
    kgPerM: 2.3,
    massMark: 'from memory',
  },
  {
    tradeSizeIn: 7 / 16,
    materialMm: 11,
    wllLb: { G30: 3700, G43: 7200, G70: 8750, G80: undefined, G100: undefined },
    kgPerM: 0.0235 * 11 * 11,
    massMark: 'derived',
  },
  {
    tradeSizeIn: 1 / 2,
    materialMm: 13,
    wllLb: { G30: 4500, G43: 9200, G70: 11300, G80: 12000, G100: 15000 },
    kgPerM: 3.9,
    massMark: 'from memory',
  },
  {
    tradeSizeIn: 5 / 8,
    materialMm: 16,
    wllLb: { G30: 6900, G43: 13000, G70: 15800, G80: 18100, G100: 22600 },
    kgPerM: 0.0235 * 16 * 16,
    massMark: 'derived',
  },
];

/**
 * Minimum breaking load ÷ WLL per grade: G30 = 4 and G43 = 3 (Boat Mechanical Systems Handbook, seen); G70, G80,
 * G100 = 4 (NACM, from memory).
 */
export const CHAIN_BREAK_FACTOR: Readonly<Record<ChainGrade, number>> = {
  G30: 4,
  G43: 3,
  G70: 4,
  G80: 4,
  G100: 4,
};

/** Certainty of each grade's breaking factor. */
export const CHAIN_BREAK_FACTOR_MARK: Readonly<Record<ChainGrade, 'seen' | 'from memory'>> = {
  G30: 'seen',
  G43: 'seen',
  G70: 'from memory',
  G80: 'from memory',
  G100: 'from memory',
};

/**
 * Metric grade convention (ISO/EN, from memory): minimum breaking force ≈ grade number ×
 * 10 N/mm² × 2 × π d²/4 (two legs of each link). Grade number: G30 → 30 … G100 → 100.
 */
export const CHAIN_GRADE_NUMBER: Readonly<Record<ChainGrade, number>> = {
  G30: 30,
  G43: 43,
  G70: 70,
  G80: 80,
  G100: 100,
};

/**
 * A grade in running text where no "Grade" label stands beside it: "grade 43". Use it, or
 * CHAIN_GRADE_LABELS ("Grade 43 high test") on its own, never a "grade" prefix before either.
 */
export const chainGradeWords = (grade: ChainGrade): string => `grade ${CHAIN_GRADE_NUMBER[grade]}`;

/** Mass coefficient for metric chain, kg/m per mm² of material diameter (fitted, ±10 %). */
export const CHAIN_MASS_COEFF_KGPM_PER_MM2 = 0.0235;

/** Trade sizes present in the table for each grade, inches. */
export const CHAIN_TRADE_SIZES_IN: Readonly<Record<ChainGrade, readonly number[]>> = {
  G30: sizesFor('G30'),
  G43: sizesFor('G43'),
  G70: sizesFor('G70'),
  G80: sizesFor('G80'),
  G100: sizesFor('G100'),
};

function sizesFor(grade: ChainGrade): number[] {
  return CHAIN_ROWS.filter((row) => row.wllLb[grade] !== undefined).map((row) => row.tradeSizeIn);
}
