/**
 * Elongation of new nylon three-strand against load as a fraction of its breaking strength
 * (from memory, approximate; lines stretch more when new and wet, less when old): pairs of
 * [load ÷ breaking, strain]. Consistent with the cruising-texts figure of a 20 ft snubber
 * stretching 4–5 ft (20–25 %) under a heavy-weather load (seen).
 */
export const NYLON_THREE_STRAND_STRAIN: readonly (readonly [number, number])[] = [
  [0, 0],
  [0.1, 0.1],
  [0.2, 0.16],
  [0.3, 0.2],
  [0.5, 0.27],
  [1, 0.4],
];

/** Double braid stretches less than three-strand at the same load fraction (from memory). */
export const DOUBLE_BRAID_STRAIN_FACTOR = 0.7;

/** Heavy-weather snubber length, 20 ft (cruising-seamanship texts, seen). */
export const SNUBBER_HEAVY_WEATHER_M = 6.096;
