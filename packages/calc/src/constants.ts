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
 * Default design factor: minimum breaking strength ÷ load required of a rode component.
 * 4 matches the breaking-to-WLL ratio of most chain grades (NACM, from memory; G30 per the
 * Boat Mechanical Systems Handbook, seen) and is common practice for anchoring gear.
 */
export const DEFAULT_DESIGN_FACTOR = 4;
