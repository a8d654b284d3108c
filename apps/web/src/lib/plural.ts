/** "3 posts", "1 post": a count with the word in the right number. */
export function countOf(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}
