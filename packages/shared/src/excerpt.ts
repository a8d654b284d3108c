// Short previews of rich text. zod-free.

const SENTENCE_END = /[.!?:;…,—–-]$/;

/**
 * A one-line preview of a post's plain text, where blocks (headings, paragraphs, list items, quotes) are
 * separated by line breaks: the blocks are joined so they never run together. A block that ends in its own
 * punctuation is followed by a space, any other (a heading, a list item) by " — ". Cut at a word boundary
 * near `max` characters, with an ellipsis.
 */
export function excerptOf(text: string, max = 220): string {
  const blocks = text
    .split(/\n+/)
    .map((b) => b.replace(/\s+/g, ' ').trim())
    .filter(Boolean);
  let out = '';
  for (const [i, block] of blocks.entries()) {
    out += block;
    if (i < blocks.length - 1) out += SENTENCE_END.test(block) ? ' ' : ' — ';
  }
  if (out.length <= max) return out;
  const cut = out.slice(0, max);
  const space = cut.lastIndexOf(' ');
  const clipped = (space > max * 0.6 ? cut.slice(0, space) : cut).replace(/[\s—–.,;:]+$/, '');
  return `${clipped}…`;
}
