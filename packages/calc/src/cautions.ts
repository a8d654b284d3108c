/**
 * Cautions shown with any rating, load or sizing result: ratings assume new gear, the
 * maker's ratings and local rules win, a professional settles doubt, and values marked
 * from memory are approximate.
 */
export const STANDARD_CAUTIONS: readonly string[] = Object.freeze([
  'Ratings are for new, undamaged gear; wear, corrosion, bending over a small radius, knots and splices reduce them.',
  "Follow the maker's ratings and markings where they differ from these tables, and follow local regulations.",
  'If in doubt, ask a qualified rigger or marine surveyor before relying on a setup.',
  'Values marked from memory are approximate: treat results as estimates, not certified ratings.',
  'Loads here are steady estimates; gusts, waves and a boat sailing at anchor add shock loads well above them.',
]);

/**
 * A frozen caution list: the standard cautions followed by `extra`. Results share these
 * lists instead of copying them, which keeps per-keystroke recomputation allocation-light.
 */
export function cautionList(...extra: string[]): readonly string[] {
  return Object.freeze([...STANDARD_CAUTIONS, ...extra]);
}
