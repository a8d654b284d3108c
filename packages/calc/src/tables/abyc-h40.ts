/** Boat hull kinds. */
export type HullType = 'sail' | 'power' | 'multihull';
/** Every hull kind, for pickers. */
export const HULL_TYPES: readonly HullType[] = ['sail', 'power', 'multihull'];
/** Human labels for the hull kinds. */
export const HULL_TYPE_LABELS: Readonly<Record<HullType, string>> = {
  sail: 'sailboat (monohull)',
  power: 'power boat',
  multihull: 'multihull',
};

/**
 * ABYC H-40 (rev. 7/03) Table 1, horizontal design loads in lb (from memory, partly
 * corroborated by the Boat Mechanical Systems Handbook worked example). Columns: LOA ft, beam sail ft, beam power ft,
 * load at 15 kn, 30 kn and 42 kn.
 */
export const ABYC_LOA_FT: readonly number[] = [10, 15, 20, 25, 30, 35, 40, 50, 60];
/** ABYC H-40 Table 1 beam column for sailboats, ft, row by row (from memory). */
export const ABYC_BEAM_SAIL_FT: readonly number[] = [4, 5, 7, 8, 9, 10, 11, 13, 15];
/** ABYC H-40 Table 1 beam column for power boats, ft (from memory). */
export const ABYC_BEAM_POWER_FT: readonly number[] = [5, 6, 8, 9, 11, 13, 14, 16, 18];
/** ABYC H-40 Table 1 loads at 15 kn (lunch hook), lb (from memory). */
export const ABYC_LOAD_15KN_LB: readonly number[] = [40, 60, 90, 125, 175, 225, 300, 400, 500];
/** ABYC H-40 Table 1 loads at 30 kn (working), lb (from memory). */
export const ABYC_LOAD_30KN_LB: readonly number[] = [
  160, 250, 360, 490, 700, 900, 1200, 1600, 2000,
];
/** ABYC H-40 Table 1 loads at 42 kn (storm), lb (from memory). */
export const ABYC_LOAD_42KN_LB: readonly number[] = [
  320, 500, 720, 980, 1400, 1800, 2400, 3200, 4000,
];
/** The table's wind columns, knots. */
export const ABYC_WIND_KN: readonly [number, number, number] = [15, 30, 42];

/**
 * Rodewise's multihull rule (common practice, approximate): the table has no multihull
 * column, so a multihull is entered by LOA in the sailboat rows and the load is multiplied
 * by 1.5 for the extra windage of a wide, high bridge-deck. Beam is not used (a
 * multihull's beam lies beyond the table's beam columns).
 */
export const MULTIHULL_LOAD_FACTOR = 1.5;
