import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inchTerm, parseQuery, searchTerms, termsOf } from './search-terms';

const texts = (s: string) => termsOf(s);

describe('the exchange tokenizer', () => {
  it.each([
    ['8mm', ['8mm']],
    ['8 mm', ['8mm']],
    ['8 millimetres', ['8mm']],
    ['0.8 cm', ['8mm']],
    ['5/16', ['5/16in']],
    ['5/16 in', ['5/16in']],
    ['5/16"', ['5/16in']],
    ['0.3125 in', ['5/16in']],
    ['10/32 inch', ['5/16in']],
    ['1 1/8 in', ['1-1/8in']],
    ['1-1/8"', ['1-1/8in']],
    ['g43', ['g43']],
    ['G43', ['g43']],
    ['G4', ['g43']],
    ['grade 43', ['g43']],
    ['Grade-43', ['g43']],
    ['gr. 70', ['g70']],
    ['G12', ['g12']],
    ['30m', ['30m']],
    ['30 m', ['30m']],
    ['30 metres', ['30m']],
    ['100 ft', ['100ft']],
    ["100'", ['100ft']],
    ['60 kg', ['60kg']],
    ['Metric chain 8 mm, 50 m', ['metric', 'chain', '8mm', '50m']],
    ['three-strand Nylon', ['three', 'strand', 'nylon']],
    ['30 miles', ['30', 'miles']],
  ])('%s → %j', (input, expected) => {
    expect(texts(input)).toEqual(expected);
  });

  it('reads a length in a query as a minimum, in metres, and keeps the other terms', () => {
    expect(parseQuery('g43 chain 30m')).toEqual({
      terms: [
        { kind: 'grade', text: 'g43' },
        { kind: 'word', text: 'chain' },
      ],
      minLengthM: 30,
    });
    expect(parseQuery('rode 100 ft').minLengthM).toBeCloseTo(30.48, 6); // 1 ft = 0.3048 m exactly
    expect(parseQuery('chain 20 m 40 m').minLengthM).toBe(40);
    expect(parseQuery('8mm chain').minLengthM).toBeUndefined();
  });

  it('reads each of its own terms back as that one term (terms are fixed points)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.oneof(
            fc.string(),
            fc.constantFrom('8 mm', '5/16"', '1 1/8 in', 'grade 43', 'G4', '30 m', "100'", 'kg'),
            fc.integer({ min: 0, max: 500 }).map(String),
          ),
          { maxLength: 8 },
        ),
        (parts) => {
          for (const term of texts(parts.join(' '))) expect(texts(term)).toEqual([term]);
        },
      ),
    );
  });

  it('does not care about case or the space between a number and its unit', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 999 }),
        fc.constantFrom('mm', 'm', 'ft', 'in', 'kg', 'MM', 'M', 'Ft', 'In', 'KG'),
        fc.constantFrom('', ' ', '  '),
        (n, unit, gap) => {
          expect(texts(`${n}${gap}${unit}`)).toEqual(texts(`${n}${unit.toLowerCase()}`));
          expect(texts(`${n}${gap}${unit}`)).toHaveLength(1);
        },
      ),
    );
  });

  it('writes every 64th of an inch the same way as a fraction, a decimal or with an inch mark', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 128 }), (sixtyFourths) => {
        const inches = sixtyFourths / 64;
        const term = inchTerm(inches);
        expect(texts(`${inches} in`)).toEqual([term]);
        expect(texts(`${inches}"`)).toEqual([term]);
        const whole = Math.floor(sixtyFourths / 64);
        const rest = sixtyFourths % 64;
        const asFraction = rest === 0 ? `${whole} in` : `${whole ? `${whole} ` : ''}${rest}/64 in`;
        expect(texts(asFraction)).toEqual([term]);
        // The term reads back as the same size.
        const m = /^(?:(\d+)-)?(?:(\d+)\/(\d+))?in$|^(\d+)in$/.exec(term);
        expect(m).not.toBeNull();
      }),
    );
  });

  it('marks each term with its kind', () => {
    expect(searchTerms('G43 chain 8 mm 30 m 5 kg 12').map((t) => t.kind)).toEqual([
      'grade',
      'word',
      'size',
      'length',
      'mass',
      'number',
    ]);
  });
});
