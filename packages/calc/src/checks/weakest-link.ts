import { CalcInputError } from '../errors';
import { DEFAULT_DESIGN_FACTOR } from '../constants';
import { STANDARD_CAUTIONS } from '../cautions';
import { optionalNumber, requireLabel, requireNumber, requireObject } from '../internal/validate';

/** One component in the load path. */
export interface RatedComponent {
  label: string;
  /** Working load limit, N. */
  wllN: number;
  /** Minimum breaking strength, N (≥ wllN). */
  minBreakN: number;
}

/** Input of {@link weakestLink}. */
export interface WeakestLinkInput {
  /** Load through the rode, N (> 0). */
  loadN: number;
  components: RatedComponent[];
  /** Breaking factor below which a warning is raised (default 4). */
  designFactor?: number;
}

/** A component's margin on its working load limit: wllN ÷ load. */
export interface WllMargin {
  label: string;
  index: number;
  margin: number;
}

/** A component's factor on its breaking strength: minBreakN ÷ load. */
export interface BreakFactor {
  label: string;
  index: number;
  factor: number;
}

/** The weakest component and both of its figures. */
export interface WeakestComponent {
  label: string;
  index: number;
  margin: number;
  factor: number;
}

/** Result of {@link weakestLink}. */
export interface WeakestLinkResult {
  /** The component that breaks first (lowest breaking factor; ties → lower WLL margin). */
  weakest: WeakestComponent;
  /** The component with the lowest WLL margin (often a shackle or splice). */
  weakestByWll: WeakestComponent;
  /** WLL margins, smallest first. */
  byWll: WllMargin[];
  /** Breaking factors, smallest first. */
  byBreak: BreakFactor[];
  /** True when the load is within every component's WLL. */
  ok: boolean;
  warnings: string[];
  basis: string;
  cautions: readonly string[];
}

/**
 * Weakest link of a rode under a load: margin = WLL ÷ load and factor = breaking strength ÷
 * load for every component, both shown because a shackle or a splice is so often the weak
 * point. `ok` when every margin ≥ 1. A chain is as strong as its weakest link (49 CFR
 * 393.108(a): the WLL of an assembly is the lowest WLL of its parts, seen).
 */
export function weakestLink(input: WeakestLinkInput): WeakestLinkResult {
  const raw = requireObject(input, '');
  const loadN = requireNumber(raw.loadN, 'loadN', 0, Infinity, 'min');
  const designFactor = optionalNumber(
    raw.designFactor,
    'designFactor',
    DEFAULT_DESIGN_FACTOR,
    1,
    20,
  );
  if (!Array.isArray(raw.components) || raw.components.length === 0) {
    throw new CalcInputError('components', 'components must be a non-empty list');
  }
  const list = raw.components as unknown[];
  const byWll: WllMargin[] = [];
  const byBreak: BreakFactor[] = [];
  const warnings: string[] = [];
  let weakest: WeakestComponent | undefined;
  let weakestByWll: WeakestComponent | undefined;
  for (let index = 0; index < list.length; index += 1) {
    const path = `components[${index}]`;
    const item = requireObject(list[index], path);
    const label = requireLabel(item.label, `${path}.label`);
    const wllN = requireNumber(item.wllN, `${path}.wllN`, 0, Infinity, 'min');
    const minBreakN = requireNumber(
      item.minBreakN,
      `${path}.minBreakN`,
      wllN,
      Infinity,
      'none',
      '(its wllN)',
    );
    const entry = { label, index, margin: wllN / loadN, factor: minBreakN / loadN };
    byWll.push({ label, index, margin: entry.margin });
    byBreak.push({ label, index, factor: entry.factor });
    if (
      weakest === undefined ||
      entry.factor < weakest.factor ||
      (entry.factor === weakest.factor && entry.margin < weakest.margin)
    ) {
      weakest = entry;
    }
    if (weakestByWll === undefined || entry.margin < weakestByWll.margin) weakestByWll = entry;
    if (entry.margin < 1) {
      warnings.push(
        `${label}: the load is ${(1 / entry.margin).toFixed(2)} × its working load limit.`,
      );
    }
    if (entry.factor < designFactor) {
      warnings.push(
        `${label}: breaking strength is only ${entry.factor.toFixed(2)} × the load, below the design factor ${designFactor}.`,
      );
    }
  }
  if (weakest === undefined || weakestByWll === undefined) {
    throw new CalcInputError('components', 'components must be a non-empty list');
  }
  byWll.sort((x, y) => x.margin - y.margin);
  byBreak.sort((x, y) => x.factor - y.factor);
  return {
    weakest,
    weakestByWll,
    byWll,
    byBreak,
    ok: byWll.every((m) => m.margin >= 1),
    warnings,
    basis:
      'Each part’s working load limit and breaking strength divided by the load; the rode is only as strong as its weakest part (49 CFR 393.108(a)).',
    cautions: STANDARD_CAUTIONS,
  };
}
