// Counted words ("1 comment", "3 comments"). zod-free: the client's entry imports it through `@app/shared/locale`.

/**
 * The interface text is English whatever the club's region, so the plural category comes from English rules
 * (Intl.PluralRules 'en': "one" only for exactly 1); the figure itself is formatted in the club's region.
 */
const ENGLISH = new Intl.PluralRules('en');

/** The word for `n`: `one` when English calls it singular, otherwise `other` ("comment" / "comments"). */
export function pluralWord(n: number, one: string, other: string): string {
  return ENGLISH.select(n) === 'one' ? one : other;
}
