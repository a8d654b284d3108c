import { describe, expect, it } from 'vitest';
import { countOf } from './plural';

describe('countOf', () => {
  it.each([
    [0, '0 comments'],
    [1, '1 comment'],
    [2, '2 comments'],
  ])('writes %i with the word in the right number', (n, text) => {
    expect(countOf(n, 'comment', 'comments')).toBe(text);
  });
});
