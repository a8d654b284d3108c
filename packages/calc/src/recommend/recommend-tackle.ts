import { SHOCK_REDUCTION_FACTOR, STORM_WIND_KN, UPLIFT_WARN_DEG } from '../constants';
import { STANDARD_CAUTIONS } from '../cautions';
import {
  optionalBoolean,
  optionalNumber,
  requireNumber,
  requireObject,
  requireOneOf,
} from '../internal/validate';
import { anchorSuggestion } from '../advice/anchor-suggestion';
import { rodeSuggestion, type ChainChoice } from '../advice/rode-suggestion';
import { snubberSuggestion } from '../advice/snubber-suggestion';
import { scopeRung } from '../geometry/scope';
import { designLoad } from '../loads/design-load';
import { chainSpec } from '../ratings/chain-spec';
import { shackleForWll } from '../ratings/shackle-spec';
import { HULL_TYPES } from '../tables/abyc-h40';
import { ANCHOR_TYPE_LABELS, ANCHOR_TYPES, BOTTOM_TYPES } from '../tables/anchor-holding';
import { CHAIN_GRADES, CHAIN_GRADE_LABELS, CHAIN_ROWS, type ChainGrade } from '../tables/chain-cfr';
import { inchFractionLabel, tradeSizeMm } from '../units/format';

import type { ReasoningStep, RecommendTackleInput, TackleRecommendation } from './recommendation';
import { reasoningOf } from './recommendation-reasoning';
import { rodeLayout } from './rode-layout';

export type { ReasoningStep, RecommendTackleInput, TackleRecommendation } from './recommendation';

/** Bow-roller height taken when none is given, m. */
export const DEFAULT_BOW_HEIGHT_M = 1;

/** Scope for the wind, from the ladder 5:1 most weather, 7:1 storms, 10:1 severe (Boat Mechanical Systems Handbook, seen); the wind steps are common practice. */
export function scopeForWind(windKn: number): number {
  if (windKn < 25) return 5;
  if (windKn <= 48) return 7;
  return 10;
}

function gypsyChain(
  gypsy: { grade: ChainGrade; tradeSizeIn?: number } | undefined,
  loadN: number,
): ChainChoice | null {
  if (gypsy?.tradeSizeIn === undefined) return null;
  const size = gypsy.tradeSizeIn;
  const row = CHAIN_ROWS.find((r) => Math.abs(r.tradeSizeIn - size) < 1e-6);
  if (row === undefined || row.wllLb[gypsy.grade] === undefined) return null;
  const spec = chainSpec({ grade: gypsy.grade, tradeSizeIn: size });
  if (spec.wllN < loadN) return null;
  return {
    ...spec,
    grade: gypsy.grade,
    tradeSizeIn: size,
    nominalMm: row.materialMm,
    governedBy: 'practice-floor',
  };
}

/**
 * The one tackle recommendation of Rodewise: design load (ABYC H-40 table), anchor (holding
 * power law, sized to survive max(wind, 42 kn)), chain (WLL ≥ load, breaking ≥ 3 × load, practice
 * floor by length), nylon (handbook rule or wet strength ≥ 2.25 × load), snubber (sized on the
 * 30 kn load), shackle (WLL ≥ the chain's), scope and the chain's lift at the anchor. Storm
 * plans (wind above 42 kn) get a chain-and-nylon rode, whose rode parts are sized at 70 % of the
 * table load because the nylon cuts shock peaks; the anchor takes no such credit. Every step is
 * explained in `reasoning` with its source. Throws {@link CalcInputError} naming the field.
 */
export function recommendTackle(input: RecommendTackleInput): TackleRecommendation {
  const raw = requireObject(input, '');
  const hull = requireOneOf(raw.hull, 'hull', HULL_TYPES);
  const anchorType = requireOneOf(raw.anchorType, 'anchorType', ANCHOR_TYPES);
  const bottom =
    raw.bottom === undefined ? undefined : requireOneOf(raw.bottom, 'bottom', BOTTOM_TYPES);
  const windKn = requireNumber(raw.windKn, 'windKn', 0, 100, 'min');
  const depthM = requireNumber(raw.depthM, 'depthM', 0, 300);
  const tideM = optionalNumber(raw.tideM, 'tideM', 0, 0, 30);
  const bowHeightM = optionalNumber(raw.bowHeightM, 'bowHeightM', DEFAULT_BOW_HEIGHT_M, 0, 10);
  const extrapolate = optionalBoolean(raw.extrapolate, 'extrapolate', false);
  const grade = requireOneOf(
    raw.chainGrade ?? input.gypsy?.grade ?? 'G43',
    'chainGrade',
    CHAIN_GRADES,
  );
  const boat = {
    loaM: input.loaM,
    hull,
    extrapolate,
    ...(input.beamM === undefined ? {} : { beamM: input.beamM }),
  };
  const load = designLoad({ ...boat, windKn });
  const storm = windKn > STORM_WIND_KN;
  const sizingKn = Math.max(windKn, STORM_WIND_KN);
  const sizingLoadN =
    sizingKn === windKn ? load.loadN : designLoad({ ...boat, windKn: sizingKn }).loadN;
  const workingLoadN = designLoad({ ...boat, windKn: 30 }).loadN;
  const peakFactor = storm ? SHOCK_REDUCTION_FACTOR : 1;
  const rodeLoadN = sizingLoadN * peakFactor;
  const loaM = input.loaM;
  const warnings: string[] = [];

  const suggestion = anchorSuggestion({
    ...boat,
    windKn,
    anchorType,
    ...(bottom === undefined ? {} : { bottom }),
    ...(input.displacementKg === undefined ? {} : { displacementKg: input.displacementKg }),
  });
  const massKg = suggestion.suggestedKg === null ? null : Math.ceil(suggestion.suggestedKg - 1e-9);

  const rode = rodeSuggestion({
    loadN: rodeLoadN,
    grade,
    loaM,
    ...(massKg === null ? {} : { anchorKg: massKg }),
  });
  warnings.push(...rode.warnings);
  const fromGypsy = gypsyChain(input.gypsy, rodeLoadN);
  let chosenChain = rode.chain;
  if (input.gypsy?.tradeSizeIn !== undefined) {
    if (fromGypsy !== null) chosenChain = fromGypsy;
    else
      warnings.push(
        `Your gypsy takes ${CHAIN_GRADE_LABELS[input.gypsy.grade]} ${inchFractionLabel(input.gypsy.tradeSizeIn)} chain, which does not carry this load: a higher grade in the gypsy's size, or a windlass change, is needed.`,
      );
  }

  const heightM = depthM + bowHeightM + tideM;
  const ladderRatio = scopeForWind(windKn);
  const {
    layout: plan,
    shape,
    steppedUp,
  } = rodeLayout({
    heightM,
    depthM,
    bowHeightM,
    tideM,
    loaM,
    storm,
    ladderRatio,
    horizontalLoadN: load.loadN * peakFactor,
    chainKgPerM: chosenChain === null ? null : chosenChain.kgPerM,
  });
  const ratio = plan.ratio;
  const rodeLengthM = plan.rodeM;
  const chainLengthM = plan.chainM;
  const nylonLengthM = plan.nylonM;
  const chain =
    chosenChain === null
      ? null
      : {
          ...chosenChain,
          lengthM: chainLengthM,
          massKg: chosenChain.kgPerM * chainLengthM,
          marginOnWll: chosenChain.wllN / rodeLoadN,
        };
  const nylon =
    rode.nylon === null
      ? null
      : {
          sizeIn: rode.nylon.sizeIn,
          sizeMm: rode.nylon.sizeMm,
          metricMm: rode.nylon.metricMm,
          lengthM: storm ? nylonLengthM : rodeLengthM,
          minBreakN: rode.nylon.minBreakN,
          workingLimitN: rode.nylon.workingLimitN,
          role: storm ? ('storm-rode' as const) : ('alternative' as const),
          governedBy: rode.nylon.governedBy,
        };
  const snubber = snubberSuggestion({ loadN: workingLoadN, loaM, storm });
  const shackle = chain === null ? null : shackleForWll(chain.wllN);
  if (chain !== null && shackle === null)
    warnings.push(
      'No shackle in the table matches this chain’s WLL: use a rated connector of at least the chain’s WLL.',
    );

  const reasoning: ReasoningStep[] = reasoningOf({
    windKn,
    load,
    sizingKn,
    sizingLoadN,
    anchorBasis: suggestion.basis,
    chain,
    rodeLoadN,
    fromGypsy: input.gypsy?.tradeSizeIn !== undefined && fromGypsy !== null,
    rodeBasis: rode.basis,
    storm,
    chainLengthM,
    nylonLengthM,
    nylon,
    snubberBasis: snubber.basis,
    shackle,
    ratio,
    heightM,
    depthM,
    bowHeightM,
    tideM,
    rodeLengthM,
    steppedUp,
    ladderRatio,
    shape,
  });
  if (shape !== null && shape.anchorAngleDeg > UPLIFT_WARN_DEG)
    warnings.push(
      `At ${windKn} kn the chain pulls the anchor ${shape.anchorAngleDeg.toFixed(0)}° upward: let out more rode, add chain, or hang a weight (kellet) on the rode.`,
    );

  if (suggestion.suggestedKg === null)
    warnings.push(
      `No anchor mass is given for ${bottom === 'rock' ? 'rock' : 'weed'}: holding there is unpredictable. Choose a sand or mud patch if you can.`,
    );
  if (anchorType === 'grapnel')
    warnings.push(
      'A grapnel is not a main anchor for a cruising boat; consider a scoop, plow or claw.',
    );
  if (load.extrapolated)
    warnings.push('The design load lies beyond the ABYC table: an extrapolation.');
  if (storm)
    warnings.push(
      'In a storm, rig two snubbers or a bridle, protect every fairlead from chafe, take off windage and have a second anchor ready.',
    );

  const cautions = [
    ...STANDARD_CAUTIONS,
    "An anchor maker's sizing chart and the gear's own markings take precedence over these estimates.",
    ...(storm
      ? [
          'Before a storm, follow the harbour master, local rules and a qualified rigger or surveyor; a safe berth or a haul-out may beat any anchor.',
        ]
      : []),
  ];
  return {
    windKn,
    storm,
    designLoad: load,
    workingLoadN,
    sizingKn,
    sizingLoadN,
    peakFactor,
    rodeLoadN,
    anchor: {
      type: anchorType,
      massKg,
      minKg: suggestion.minKg,
      suggestedKg: suggestion.suggestedKg,
      softMud: suggestion.softMud,
      suggestion,
    },
    chain,
    nylon,
    snubber,
    shackle,
    scope: { ratio, rung: scopeRung(ratio) ?? null, heightM, rodeLengthM },
    catenary: shape,
    rode,
    reasoning,
    warnings,
    basis: `Recommendation for a ${ANCHOR_TYPE_LABELS[anchorType]} anchor at ${windKn} kn: ${reasoning.map((r) => r.text).join(' ')}`,
    cautions,
  };
}

/** Imperial trade fraction of a nylon or chain size with its mm: "3/4 in (19.1 mm)". */
export function sizeLabel(sizeIn: number): string {
  return `${inchFractionLabel(sizeIn)} (${tradeSizeMm(sizeIn)} mm)`;
}
