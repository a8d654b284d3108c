import { describe, expect, it } from 'vitest';
import { countOf, pluralWord } from './locale-format';

describe('countOf', () => {
  it('uses the singular for exactly one and the plural for zero and two', () => {
    expect(countOf(0, 'comment', 'comments', 'en-GB')).toBe('0 comments');
    expect(countOf(1, 'comment', 'comments', 'en-GB')).toBe('1 comment');
    expect(countOf(2, 'comment', 'comments', 'en-GB')).toBe('2 comments');
  });

  it('keeps English plural rules in a region whose own rules call zero singular', () => {
    // French CLDR rules put 0 in "one"; the words are English, so 0 stays plural.
    expect(new Intl.PluralRules('fr-FR').select(0)).toBe('one');
    expect(countOf(0, 'reply', 'replies', 'fr-FR')).toBe('0 replies');
    expect(countOf(1, 'reply', 'replies', 'fr-FR')).toBe('1 reply');
  });

  it('formats the figure in the region and treats 1.5 as plural', () => {
    expect(countOf(1204, 'post', 'posts', 'en-GB')).toBe('1,204 posts');
    expect(countOf(1204, 'post', 'posts', 'de-DE')).toBe('1.204 posts');
    expect(pluralWord(1.5, 'metre', 'metres')).toBe('metres');
    expect(pluralWord(-1, 'day', 'days')).toBe('day');
  });
});
