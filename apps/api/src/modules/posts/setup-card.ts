import {
  ANCHOR_TYPE_LABELS,
  CHAIN_GRADE_LABELS,
  CalcInputError,
  inchFractionLabel,
  tacklePlan,
} from '@app/calc';
import type { PostSetup, SetupCardDto } from '@app/shared';
import { AppError } from '../../errors/app-error';

/**
 * The figures of a post's tackle setup, computed by @app/calc's `tacklePlan`: design load (ABYC H-40 table),
 * the weakest link and its margin, scope and catenary at the stated depth, with the library's cautions.
 * An input the engineering rejects becomes VALIDATION_FAILED naming the `setup.…` field.
 */
export function computeSetupCard(setup: PostSetup): SetupCardDto {
  const { boat } = setup;
  let r;
  try {
    r = tacklePlan({
      boat: {
        loaM: boat.loaM,
        hull: boat.hull,
        bowHeightM: boat.bowHeightM,
        ...(boat.beamM === undefined ? {} : { beamM: boat.beamM }),
        ...(boat.displacementKg === undefined ? {} : { displacementKg: boat.displacementKg }),
      },
      windKn: setup.windKn,
      depthM: setup.depthM,
      tideM: setup.tideM,
      ...(setup.bottom ? { bottom: setup.bottom } : {}),
      extrapolate: true,
      components: setup.components,
    });
  } catch (err) {
    if (err instanceof CalcInputError) {
      const field = `setup.${err.field || 'components'}`;
      throw new AppError('VALIDATION_FAILED', 'The setup cannot be computed', {
        [field]: err.message,
      });
    }
    throw err;
  }
  const weakest = r.weakestLink?.weakest;
  return {
    setup,
    loadN: r.loadN,
    heightM: r.heightM,
    rodeLengthM: r.rodeLengthM,
    scopeRatio: r.scopeRatio,
    scopeLabel: r.scopeRung?.label ?? null,
    weakest: weakest
      ? { label: weakest.label, marginOnWll: weakest.margin, breakFactor: weakest.factor }
      : null,
    withinWll: r.weakestLink ? r.weakestLink.ok : null,
    catenary: r.catenary
      ? {
          suspendedM: r.catenary.suspendedM,
          onBottomM: r.catenary.onBottomM,
          bowAngleDeg: r.catenary.bowAngleDeg,
          anchorAngleDeg: r.catenary.anchorAngleDeg,
          liftsAtAnchor: r.catenary.liftsAtAnchor,
        }
      : null,
    anchor: r.anchor
      ? {
          massKg: r.anchor.massKg,
          neededKg: r.anchor.neededKg,
          meetsMinimum: r.anchor.meetsMinimum,
          meetsSuggested: r.anchor.meetsSuggested,
        }
      : null,
    recommendation: r.recommendation
      ? {
          anchorType: ANCHOR_TYPE_LABELS[r.recommendation.anchor.type],
          anchorKg: r.recommendation.anchor.massKg,
          chain: r.recommendation.chain
            ? `${inchFractionLabel(r.recommendation.chain.tradeSizeIn)} (${r.recommendation.chain.nominalMm} mm) ${CHAIN_GRADE_LABELS[r.recommendation.chain.grade]}`
            : null,
          nylon: r.recommendation.nylon
            ? `${inchFractionLabel(r.recommendation.nylon.sizeIn)} (${r.recommendation.nylon.sizeMm} mm) nylon${r.recommendation.nylon.role === 'alternative' ? ' if the rode is chain and rope' : ' rode'}`
            : null,
          snubber: `${inchFractionLabel(r.recommendation.snubber.sizeIn)} (${r.recommendation.snubber.diameterMm} mm) nylon, ${r.recommendation.snubber.lengthM} m${r.recommendation.snubber.bridle ? ', two or a bridle' : ''}`,
        }
      : null,
    warnings: r.warnings,
    cautions: [...r.cautions],
    basis: r.basis,
  };
}
