/**
 * The keys of a label record in the order they are written, as the non-empty tuple `z.enum`
 * takes: the record is the one place a value and the words people read for it are listed.
 */
export function labelKeys<K extends string>(
  labels: Readonly<Record<K, string>>,
): readonly [K, ...K[]] {
  return Object.keys(labels) as [K, ...K[]];
}
