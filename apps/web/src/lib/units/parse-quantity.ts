import {
  KG_PER_LB,
  M_PER_FT,
  MPS_PER_KN,
  N_PER_LBF,
  STANDARD_GRAVITY_MPS2,
  type UnitSystem,
} from '@app/calc';

/**
 * What a field measures, and the SI unit its parsed value is given in:
 * `length` and `diameter` → metres, `mass` → kilograms, `force` → newtons, `speed` → knots
 * (the unit the wind is entered in everywhere, including the calc library).
 */
export type QuantityKind = 'length' | 'diameter' | 'mass' | 'force' | 'speed';

/** The outcome of {@link parseQuantity}: a value in the kind's base unit, or a message to show. */
export type ParseResult = { ok: true; value: number } | { ok: false; error: string };

interface UnitDef {
  /** Factor from this unit to the kind's base unit. */
  factor: number;
  /** Words and symbols for the unit, lower case. */
  names: readonly string[];
}

const M_PER_IN = M_PER_FT / 12;

/** Units each kind accepts, by the words and symbols people type. */
const UNITS: Record<QuantityKind, readonly UnitDef[]> = {
  length: [
    { factor: 1, names: ['m', 'metre', 'metres', 'meter', 'meters'] },
    { factor: 0.01, names: ['cm'] },
    { factor: 0.001, names: ['mm'] },
    { factor: M_PER_FT, names: ['ft', 'feet', 'foot', "'", '’'] },
    { factor: M_PER_IN, names: ['in', 'inch', 'inches', '"', '”', "''"] },
    { factor: 1.8288, names: ['fathom', 'fathoms', 'fm'] }, // 6 ft, exact
  ],
  diameter: [
    { factor: 0.001, names: ['mm'] },
    { factor: 0.01, names: ['cm'] },
    { factor: M_PER_IN, names: ['in', 'inch', 'inches', '"', '”', "''"] },
  ],
  mass: [
    { factor: 1, names: ['kg', 'kgs', 'kilo', 'kilos', 'kilogram', 'kilograms'] },
    { factor: 0.001, names: ['g', 'gram', 'grams'] },
    { factor: 1000, names: ['t', 'tonne', 'tonnes'] },
    { factor: KG_PER_LB, names: ['lb', 'lbs', 'pound', 'pounds'] },
  ],
  force: [
    { factor: 1, names: ['n', 'newton', 'newtons'] },
    { factor: 1000, names: ['kn', 'kilonewton', 'kilonewtons'] },
    { factor: N_PER_LBF, names: ['lbf', 'lb', 'lbs'] },
    { factor: STANDARD_GRAVITY_MPS2, names: ['kgf'] },
  ],
  speed: [
    { factor: 1, names: ['kn', 'kt', 'kts', 'knot', 'knots'] },
    { factor: 1 / MPS_PER_KN, names: ['m/s', 'mps'] },
    { factor: 1000 / 3600 / MPS_PER_KN, names: ['km/h', 'kph', 'kmh'] },
    { factor: 1609.344 / 3600 / MPS_PER_KN, names: ['mph'] },
  ],
};

/** The unit a bare number is read in, per system. */
const BARE_UNIT: Record<QuantityKind, Record<UnitSystem, string>> = {
  length: { metric: 'm', imperial: 'ft' },
  diameter: { metric: 'mm', imperial: 'in' },
  mass: { metric: 'kg', imperial: 'lb' },
  force: { metric: 'kn', imperial: 'lbf' },
  speed: { metric: 'kn', imperial: 'kn' },
};

/** Examples for hints and error messages. */
export const QUANTITY_EXAMPLES: Record<QuantityKind, string> = {
  length: '32 ft, 9.75 m or 32\' 6"',
  diameter: '5/16 in, 3/8" or 10 mm',
  mass: '16 kg or 35 lb',
  force: '4 kN or 900 lbf',
  speed: '30 kn or 15 m/s',
};

// A number: decimal, fraction or mixed number ("1 1/8"), with an optional leading minus.
const NUMBER = String.raw`-?\d+\s+\d+\/\d+|-?\d+\/\d+|-?(?:\d+(?:\.\d*)?|\.\d+)`;
const PART = new RegExp(String.raw`^(${NUMBER})\s*([a-z/'’"”]*)`);

function numberValue(text: string): number {
  const mixed = /^(-?)(\d+)\s+(\d+)\/(\d+)$/.exec(text);
  if (mixed) {
    const [, sign, whole, num, den] = mixed;
    const value = Number(whole) + Number(num) / Number(den);
    return sign === '-' ? -value : value;
  }
  const fraction = /^(-?\d+)\/(\d+)$/.exec(text);
  if (fraction) return Number(fraction[1]) / Number(fraction[2]);
  return Number(text);
}

function unitFactor(kind: QuantityKind, name: string): number | undefined {
  return UNITS[kind].find((unit) => unit.names.includes(name))?.factor;
}

function failure(kind: QuantityKind): ParseResult {
  return {
    ok: false,
    error: `Enter a number, with or without a unit, e.g. ${QUANTITY_EXAMPLES[kind]}`,
  };
}

/**
 * Reads what a person typed into a quantity field: `32 ft`, `9.75 m`, `32'`, `32' 6"`,
 * `5/16 in`, `1 1/8"`, `16 kg`, `900 lbf`, `30 kn`, or a bare number read in `system`'s usual
 * unit (m or ft; mm or in for diameters; kg or lb; kN or lbf; knots for speed). Returns the value in
 * the kind's base unit (see {@link QuantityKind}) or a message naming what is accepted; never throws.
 */
export function parseQuantity(text: string, kind: QuantityKind, system: UnitSystem): ParseResult {
  let rest = text.trim().toLowerCase().replace(/,/g, '');
  if (rest === '') return { ok: false, error: 'Enter a value' };
  let total = 0;
  let parts = 0;
  while (rest !== '') {
    const match = PART.exec(rest);
    if (!match || parts === 2) return failure(kind);
    const [whole, numberText = '', unitText = ''] = match;
    const value = numberValue(numberText.trim());
    if (!Number.isFinite(value)) return failure(kind);
    // After feet, a bare number means inches (32' 6).
    const bare = parts === 1 ? 'in' : BARE_UNIT[kind][system];
    const factor = unitFactor(kind, unitText === '' ? bare : unitText);
    if (factor === undefined) {
      return {
        ok: false,
        error: `"${unitText}" is not a unit for this field; try ${QUANTITY_EXAMPLES[kind]}`,
      };
    }
    rest = rest.slice(whole.length).trim();
    // Only feet may be followed by a second part, and only by inches (32' 6").
    const feetFirst = parts === 0 && kind === 'length' && factor === M_PER_FT;
    if (parts === 0 && rest !== '' && !feetFirst) return failure(kind);
    if (parts === 1 && factor !== M_PER_IN) return failure(kind);
    total += value * factor;
    parts += 1;
  }
  return { ok: true, value: total };
}
