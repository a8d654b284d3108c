import { CalcInputError } from '../errors';
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
  /** Breaking factor below which a warning is raised (none when omitted: each working limit already carries its part's factor). */
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
  /** The weakest link: lowest margin on its working limit (ties → lower breaking factor). */
  weakest: WeakestComponent;
  /** The component with the lowest breaking strength ÷ load: the one that would part first in an overload. */
  weakestByBreak: WeakestComponent;
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
 * Weakest link of a rode under a load: margin = working limit ÷ load and factor = breaking
 * strength ÷ load for every component; the weakest link is the smallest margin, because a
 * shackle or a splice is so often the weak point. `ok` when every margin ≥ 1. A chain is as strong as its weakest link (49 CFR
 * 393.108(a): the WLL of an assembly is the lowest WLL of its parts, seen).
 */
export function weakestLink(input: WeakestLinkInput): WeakestLinkResult {
  const raw = requireObject(input, '');
  const loadN = requireNumber(raw.loadN, 'loadN', 0, Infinity, 'min');
  const designFactor = optionalNumber(raw.designFactor, 'designFactor', 0, 1, 20);
  if (!Array.isArray(raw.components) || raw.components.length === 0) {
    throw new CalcInputError('components', 'components must be a non-empty list');
  }
  const list = raw.components as unknown[];
  const byWll: WllMargin[] = [];
  const byBreak: BreakFactor[] = [];
  const warnings: string[] = [];
  let weakest: WeakestComponent | undefined;
  let weakestByBreak: WeakestComponent | undefined;
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
      entry.margin < weakest.margin ||
      (entry.margin === weakest.margin && entry.factor < weakest.factor)
    ) {
      weakest = entry;
    }
    if (weakestByBreak === undefined || entry.factor < weakestByBreak.factor)
      weakestByBreak = entry;
    if (entry.margin < 1) {
      warnings.push(
        `${label}: the load is ${(1 / entry.margin).toFixed(2)} × its working load limit.`,
      );
    }
    if (designFactor > 0 && entry.factor < designFactor) {
      warnings.push(
        `${label}: breaking strength is only ${entry.factor.toFixed(2)} × the load, below the design factor ${designFactor}.`,
      );
    }
  }
  if (weakest === undefined || weakestByBreak === undefined) {
    throw new CalcInputError('components', 'components must be a non-empty list');
  }
  byWll.sort((x, y) => x.margin - y.margin);
  byBreak.sort((x, y) => x.factor - y.factor);
  return {
    weakest,
    weakestByBreak,
    byWll,
    byBreak,
    ok: byWll.every((m) => m.margin >= 1),
    warnings,
    basis:
      'Each part’s working limit (its maker’s WLL for chain and fittings; wet breaking strength ÷ 2.25 for nylon) and breaking strength divided by the load; the weakest link is the smallest working-limit margin, as the rode is only as strong as its weakest part (49 CFR 393.108(a)).',
    cautions: STANDARD_CAUTIONS,
  };
}
