import type { PlanComponents, PlanConnector } from '../plan/plan-input';
import type { TackleRecommendation } from './recommendation';

/**
 * The recommendation as a plan's components, so a saved plan carries exactly what was shown:
 * the anchor, the chain at its length, the storm rode's nylon (spliced to the chain), the
 * snubber (two when it says to rig two or a bridle), the anchor shackle, and the nylon it offers
 * for a chain-and-rope rode when the rode it sizes is all chain.
 */
export function planComponentsFrom(rec: TackleRecommendation): PlanComponents {
  const connectors: PlanConnector[] = [];
  if (rec.shackle !== null)
    connectors.push({ label: 'anchor shackle', kind: 'shackle', nominalIn: rec.shackle.nominalIn });
  const components: PlanComponents = {
    snubber: {
      material: 'nylon',
      diameterMm: rec.snubber.diameterMm,
      lengthM: rec.snubber.lengthM,
      ...(rec.snubber.bridle ? { count: 2 as const } : {}),
    },
    connectors,
  };
  if (rec.anchor.massKg !== null)
    components.anchor = { type: rec.anchor.type, massKg: rec.anchor.massKg };
  if (rec.chain !== null)
    components.chain = {
      grade: rec.chain.grade,
      tradeSizeIn: rec.chain.tradeSizeIn,
      lengthM: rec.chain.lengthM,
    };
  if (rec.nylon !== null && rec.nylon.role === 'storm-rode') {
    components.rode = {
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: rec.nylon.sizeMm,
      lengthM: rec.nylon.lengthM,
    };
    connectors.push({ label: 'chain-to-rope splice', kind: 'splice' });
  } else if (rec.nylon !== null) {
    components.nylonAlternative = {
      material: 'nylon',
      construction: 'three-strand',
      diameterMm: rec.nylon.sizeMm,
      lengthM: rec.nylon.lengthM,
    };
  }
  return components;
}
