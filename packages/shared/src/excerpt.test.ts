import { describe, expect, it } from 'vitest';
import { excerptOf } from './excerpt';

describe('excerptOf', () => {
  it('puts a dash between a heading and the paragraph under it', () => {
    expect(excerptOf('What changed\nSeven metres of chain came off the locker.')).toBe(
      'What changed — Seven metres of chain came off the locker.',
    );
  });

  it('keeps list items apart and lets sentences run on with a space', () => {
    const text = 'Before you leave\n\nCheck the shackle wire.\nSnubber on\nScope at least 5:1\n';
    expect(excerptOf(text)).toBe(
      'Before you leave — Check the shackle wire. Snubber on — Scope at least 5:1',
    );
  });

  it('folds spaces inside a block and drops empty blocks', () => {
    expect(excerptOf('  Two   spaces \n\n\n  and a tab\there ')).toBe(
      'Two spaces — and a tab here',
    );
    expect(excerptOf('')).toBe('');
  });

  it('cuts long text at a word with an ellipsis, never through a separator', () => {
    const text = `Heading\n${'word '.repeat(100)}`;
    const out = excerptOf(text, 60);
    expect(out.length).toBeLessThanOrEqual(61);
    expect(out.startsWith('Heading — word word')).toBe(true);
    expect(out.endsWith('word…')).toBe(true);
    expect(excerptOf('Short\nLonger paragraph here', 8)).toBe('Short…');
  });
});
