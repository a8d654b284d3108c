import { CalcInputError, tacklePlan } from '@app/calc';
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
    warnings: r.warnings,
    cautions: [...r.cautions],
    basis: r.basis,
  };
}
