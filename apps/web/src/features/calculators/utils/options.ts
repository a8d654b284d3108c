import {
  ANCHOR_TYPE_LABELS,
  ANCHOR_TYPES,
  BOTTOM_TYPE_LABELS,
  BOTTOM_TYPES,
  CHAIN_GRADE_LABELS,
  CHAIN_GRADES,
  CHAIN_TRADE_SIZES_IN,
  HULL_TYPE_LABELS,
  HULL_TYPES,
  ROPE_CONSTRUCTION_LABELS,
  ROPE_CONSTRUCTIONS,
  ROPE_MATERIAL_LABELS,
  ROPE_MATERIALS,
  SHACKLE_SIZES_IN,
  inchFractionLabel,
  type BottomType,
  type ChainGrade,
} from '@app/calc';

/** Picker options built from the calc library's own label lists. */
export const HULL_OPTIONS = HULL_TYPES.map((v) => ({ value: v, label: HULL_TYPE_LABELS[v] }));
export const ANCHOR_OPTIONS = ANCHOR_TYPES.map((v) => ({ value: v, label: ANCHOR_TYPE_LABELS[v] }));
export const BOTTOM_OPTIONS: readonly { value: BottomType | ''; label: string }[] = [
  { value: '', label: 'not known (firm mud or mixed; soft mud shown too)' },
  ...BOTTOM_TYPES.map((v) => ({ value: v, label: BOTTOM_TYPE_LABELS[v] })),
];
export const GRADE_OPTIONS = CHAIN_GRADES.map((v) => ({ value: v, label: CHAIN_GRADE_LABELS[v] }));
export const MATERIAL_OPTIONS = ROPE_MATERIALS.map((v) => ({
  value: v,
  label: ROPE_MATERIAL_LABELS[v],
}));
export const CONSTRUCTION_OPTIONS = ROPE_CONSTRUCTIONS.map((v) => ({
  value: v,
  label: ROPE_CONSTRUCTION_LABELS[v],
}));
export const SHACKLE_OPTIONS = SHACKLE_SIZES_IN.map((v) => ({
  value: String(v),
  label: inchFractionLabel(v),
}));

/** Trade sizes the chain table holds for a grade. */
export const chainSizeOptions = (grade: ChainGrade) =>
  CHAIN_TRADE_SIZES_IN[grade].map((v) => ({ value: String(v), label: inchFractionLabel(v) }));

/** `tradeSizeIn` when the grade's table holds it, otherwise the grade's first size. */
export function sizeInGrade(grade: ChainGrade, tradeSizeIn: number): number {
  const sizes = CHAIN_TRADE_SIZES_IN[grade];
  return sizes.includes(tradeSizeIn) ? tradeSizeIn : (sizes[0] ?? tradeSizeIn);
}

/** Narrows a select's string to one of `allowed`, falling back to the first. */
export function pick<T extends string>(value: string, allowed: readonly T[], fallback: T): T {
  return (allowed as readonly string[]).includes(value) ? (value as T) : fallback;
}
