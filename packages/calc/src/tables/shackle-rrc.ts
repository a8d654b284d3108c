/** One row of the screw-pin anchor shackle table. */
export interface ShackleRow {
  nominalIn: number;
  /** Working load limit, short tons of 2,000 lb. */
  wllShortTons: number;
}

/**
 * Forged screw-pin anchor shackles, WLL in short tons, RR-C-271 (from memory; the 1/2, 5/8
 * and 3/4 in rows corroborated by RR-C-271D minimum ultimate strengths 20,000 / 32,500 /
 * 47,500 lb ÷ its design factor 5, seen).
 */
export const SHACKLE_ROWS: readonly ShackleRow[] = [
  { nominalIn: 3 / 16, wllShortTons: 1 / 3 },
  { nominalIn: 1 / 4, wllShortTons: 1 / 2 },
  { nominalIn: 5 / 16, wllShortTons: 3 / 4 },
  { nominalIn: 3 / 8, wllShortTons: 1 },
  { nominalIn: 7 / 16, wllShortTons: 1.5 },
  { nominalIn: 1 / 2, wllShortTons: 2 },
  { nominalIn: 5 / 8, wllShortTons: 3.25 },
  { nominalIn: 3 / 4, wllShortTons: 4.75 },
  { nominalIn: 7 / 8, wllShortTons: 6.5 },
  { nominalIn: 1, wllShortTons: 8.5 },
];

/** RR-C-271D design factor for shackles: minimum ultimate strength ÷ WLL (seen). */
export const SHACKLE_DESIGN_FACTOR = 5;

/** Shackle sizes in the table, inches. */
export const SHACKLE_SIZES_IN: readonly number[] = SHACKLE_ROWS.map((row) => row.nominalIn);
