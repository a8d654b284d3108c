/** Standard gravity, m/s² (CGPM 1901, exact). Converts kg to N of weight. */
export const STANDARD_GRAVITY_MPS2 = 9.80665;

/** Density of steel, kg/m³ (EN 1993-1-1, seen). */
export const STEEL_DENSITY_KGPM3 = 7850;

/** Density of sea water, kg/m³ (general physics references, seen). */
export const SEA_WATER_DENSITY_KGPM3 = 1025;

/** Density of fresh water, kg/m³ (general physics references, seen). */
export const FRESH_WATER_DENSITY_KGPM3 = 1000;

/** Density of air at sea level for the drag formula F = ½ ρ Cd A V², kg/m³ (ISA, seen). */
export const AIR_DENSITY_KGPM3 = 1.225;

/**
 * Factor of safety on the breaking strength of new chain in straight runs, UFC 4-159-03 Table
 * 3-7 (seen). A chain whose working load limit carries the load meets it in every grade here
 * (G43 breaks at 3 × WLL, the others at 4 ×), so chain is sized by one rule: WLL ≥ load.
 */
export const CHAIN_SAFETY_FACTOR = 3;
/**
 * Anchoring factor for nylon rode: its wet minimum breaking strength must be at least 2.25 ×
 * the peak load, so in the design gust it works at no more than about 45 % of its wet strength,
 * inside nylon's elastic range (Rodewise's rule, common practice for anchoring, where a boat
 * lies to its rode for hours; UFC 4-159-03 asks 3.0 of permanent moorings, which lie to their
 * lines for years). The 49 CFR 393.108 tie-down WLL is a cargo rating, never this limit.
 */
export const NYLON_ANCHORING_FACTOR = 2.25;
/**
 * Snubber: wet minimum breaking strength at least 5 × the working (30 kn) load, so it works at
 * a fifth of its strength and stretches about 15 % (common practice, from memory); sized once,
 * and doubled as a bridle in storms rather than made thicker.
 */
export const SNUBBER_WORKING_FACTOR = 5;
/**
 * Peak-load credit for a long nylon section or snubber (at least 6.1 m, 20 ft) in the rode at
 * storm winds: chain, rope, fittings and the anchor are checked at 70 % of the table load.
 * Rodewise's assumption, deliberately below the 50–70 % peak reductions measured for long
 * snubbers (Practical Sailor, "What is ideal snubber size?", 2016, seen).
 */
export const SHOCK_REDUCTION_FACTOR = 0.7;
/** Nylon in the rode (rope section or snubber) that earns the peak-load credit, m (20 ft). */
export const SHOCK_NYLON_MIN_M = 6.096;
/** Winds above this are storm plans (the ABYC table's last column), kn. */
export const STORM_WIND_KN = 42;
/** Pull angle above the seabed at the anchor beyond which Rodewise warns, degrees (about 5°, from memory). */
export const UPLIFT_WARN_DEG = 5;
