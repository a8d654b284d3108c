import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inchFractionLabel } from './format';
import { parseInchText, parseSizeText, sizeTextOf } from './size-text';

// 1 in = 25.4 mm exactly (international inch, NIST SP 811 B.8).
const mmOf = (text: string) => {
  const r = parseSizeText(text);
  return r.ok ? r.mm : null;
};

describe('typed sizes', () => {
  it.each([
    ['8', 8],
    ['8 mm', 8],
    ['9.5mm', 9.5],
    ['9,5 mm', 9.5],
    ['1 cm', 10],
    ['5/16', 7.9375],
    ['5/16 in', 7.9375],
    ['5/16"', 7.9375],
    ['3/8 inch', 9.525],
    ['1/2"', 12.7],
    ['0.375 in', 9.525],
    ['1 1/8', 28.575],
    ['1-1/8 in', 28.575],
  ])('%s is %f mm', (text, mm) => {
    expect(mmOf(text)).toBeCloseTo(mm, 9);
  });

  it.each(['', 'abc', '5/0', '3/8 mm', 'eight', '1/2/3', '-4'])('refuses %j', (text) => {
    const r = parseSizeText(text);
    expect(r.ok).toBe(false);
  });

  it('reads inch sizes for the listing form, and refuses millimetres there', () => {
    expect(parseInchText('5/16')).toBe(0.3125);
    expect(parseInchText('0.3125')).toBe(0.3125);
    expect(parseInchText('1 1/8"')).toBe(1.125);
    expect(parseInchText('8 mm')).toBeNull();
    expect(parseInchText('')).toBeNull();
  });

  it('shows an inch size as its trade fraction and reads it back to the same millimetres', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 64 }), (sixteenths) => {
        const mm = (sixteenths / 16) * 25.4;
        const label = sizeTextOf(mm);
        expect(label).toBe(inchFractionLabel(sixteenths / 16));
        expect(label).not.toMatch(/\d\.\d/);
        expect(mmOf(label)).toBeCloseTo(mm, 9);
      }),
    );
    expect(sizeTextOf(8)).toBe('8 mm');
    expect(sizeTextOf(9.5)).toBe('9.5 mm');
  });
});
