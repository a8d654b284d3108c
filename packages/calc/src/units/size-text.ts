import { inchFractionLabel } from './format';
import { MM_PER_IN } from './units';

/** A size typed by a person: millimetres, or inches (as a trade fraction or a decimal). */
export type ParsedSize =
  { ok: true; mm: number; unit: 'mm' | 'in' } | { ok: false; message: string };

const FRACTION = /^(?:(\d+)[\s-]+)?(\d+)\s*\/\s*(\d+)$/;
const NUMBER = /^(\d+(?:\.\d*)?|\.\d+)$/;
const INCH_MARK = /\s*(?:inches|inch|in|"|″|”)$/i;
const MM_MARK = /\s*(?:millimetres|millimeters|mm)$/i;
const CM_MARK = /\s*(?:centimetres|centimeters|cm)$/i;

export const SIZE_TEXT_HINT = 'Write a size like 8 mm, 5/16 or 3/8 in';

/**
 * Reads a size as people write it: "8", "8 mm", "9.5mm", "1 cm" are millimetres; "5/16", "1 1/8", "3/8 in",
 * `1/2"`, "0.375 in" are inches (a bare fraction is inches, the way trade sizes are written; a bare number is
 * millimetres). Comma decimals ("9,5 mm") are read too. Returns the size in millimetres.
 */
export function parseSizeText(text: string): ParsedSize {
  let t = text.trim().replace(/(\d),(\d)/g, '$1.$2');
  if (t === '') return { ok: false, message: 'Enter a size' };
  let unit: 'mm' | 'in' | 'cm' | undefined;
  if (INCH_MARK.test(t)) {
    unit = 'in';
    t = t.replace(INCH_MARK, '');
  } else if (MM_MARK.test(t)) {
    unit = 'mm';
    t = t.replace(MM_MARK, '');
  } else if (CM_MARK.test(t)) {
    unit = 'cm';
    t = t.replace(CM_MARK, '');
  }
  t = t.trim();
  const fraction = FRACTION.exec(t);
  if (fraction) {
    const den = Number(fraction[3]);
    if (den === 0 || unit === 'mm' || unit === 'cm') return { ok: false, message: SIZE_TEXT_HINT };
    const inches = Number(fraction[1] ?? 0) + Number(fraction[2]) / den;
    if (inches <= 0) return { ok: false, message: SIZE_TEXT_HINT };
    return { ok: true, mm: inches * MM_PER_IN, unit: 'in' };
  }
  if (!NUMBER.test(t)) return { ok: false, message: SIZE_TEXT_HINT };
  const value = Number(t);
  if (!Number.isFinite(value)) return { ok: false, message: SIZE_TEXT_HINT };
  if (unit === 'in') return { ok: true, mm: value * MM_PER_IN, unit: 'in' };
  return { ok: true, mm: unit === 'cm' ? value * 10 : value, unit: 'mm' };
}

/** Reads an inch size ("5/16", "1 1/8", "0.375", `3/8"`) as decimal inches; millimetres are refused. */
export function parseInchText(text: string): number | null {
  const t = text.trim();
  if (t === '' || MM_MARK.test(t) || CM_MARK.test(t)) return null;
  const withUnit = INCH_MARK.test(t) ? t : `${t} in`;
  const parsed = parseSizeText(withUnit);
  return parsed.ok ? parsed.mm / MM_PER_IN : null;
}

/**
 * A size in millimetres for a person to read back: a whole number of 16ths of an inch shows as its trade
 * fraction ("5/16 in": 7.9375 mm came from an inch size), anything else in millimetres ("8 mm", "9.5 mm").
 */
export function sizeTextOf(mm: number): string {
  const sixteenths = (mm / MM_PER_IN) * 16;
  if (mm > 0 && Math.abs(sixteenths - Math.round(sixteenths)) < 1e-6)
    return inchFractionLabel(mm / MM_PER_IN);
  return `${Math.round(mm * 100) / 100} mm`;
}
