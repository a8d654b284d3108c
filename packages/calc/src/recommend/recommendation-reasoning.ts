import { NYLON_ANCHORING_FACTOR, SHOCK_REDUCTION_FACTOR, UPLIFT_WARN_DEG } from '../constants';
import type { CatenaryResult } from '../geometry/catenary';
import type { DesignLoadResult } from '../loads/design-load';
import { CHAIN_GRADE_LABELS } from '../tables/chain-cfr';
import { inchFractionLabel } from '../units/format';
import type { ReasoningStep, TackleRecommendation } from './recommendation';

const kN = (n: number) => `${(n / 1000).toFixed(1)} kN`;

/** What {@link reasoningOf} explains: the figures `recommendTackle` arrived at (lengths m, loads N, wind kn). */
export interface ReasoningFacts {
  windKn: number;
  load: DesignLoadResult;
  sizingKn: number;
  sizingLoadN: number;
  anchorBasis: string;
  chain: TackleRecommendation['chain'];
  rodeLoadN: number;
  /** The chain is the gypsy's size (which carries the load). */
  fromGypsy: boolean;
  rodeBasis: string;
  storm: boolean;
  chainLengthM: number;
  nylonLengthM: number;
  nylon: TackleRecommendation['nylon'];
  snubberBasis: string;
  shackle: TackleRecommendation['shackle'];
  ratio: number;
  heightM: number;
  depthM: number;
  bowHeightM: number;
  tideM: number;
  rodeLengthM: number;
  steppedUp: boolean;
  ladderRatio: number;
  shape: CatenaryResult | null;
}

/** The recommendation's reasoning in plain words, one step per topic, each with its source. */
export function reasoningOf(f: ReasoningFacts): ReasoningStep[] {
  const { windKn, load, chain, nylon, shackle, shape } = f;
  const reasoning: ReasoningStep[] = [];
  const rowText =
    load.governedBy === 'beam'
      ? `entered by beam, which gives a larger load than the length here (the ${load.rowLoaFt.toFixed(1)} ft row)`
      : `entered by length (the ${load.rowLoaFt.toFixed(1)} ft row)`;
  reasoning.push({
    topic: 'load',
    text:
      `Design load ${kN(load.loadN)} at ${windKn} kn from the ABYC H-40 table of horizontal loads (values from memory), ${rowText}` +
      (windKn > 42
        ? ', scaled with wind speed squared beyond the 42 kn column (extrapolated)'
        : '') +
      `. The working gear is sized for ${f.sizingKn} kn (${kN(f.sizingLoadN)}), because it must survive a squall.`,
  });
  reasoning.push({ topic: 'anchor', text: f.anchorBasis });
  if (chain !== null)
    reasoning.push({
      topic: 'chain',
      text:
        `${CHAIN_GRADE_LABELS[chain.grade]} ${inchFractionLabel(chain.tradeSizeIn)} (${chain.nominalMm} mm): WLL ${kN(chain.wllN)}, ` +
        `${chain.marginOnWll.toFixed(2)} × the ${kN(f.rodeLoadN)} it is sized for. ` +
        (chain.governedBy === 'practice-floor'
          ? f.fromGypsy
            ? 'Your gypsy’s size, which carries the load. '
            : 'The load alone would allow a lighter chain; the practice floor for the boat’s length sets this size. '
          : '') +
        (f.rodeBasis.split('Nylon')[0] ?? '').trim(),
    });
  if (f.storm)
    reasoning.push({
      topic: 'chain',
      text: `Storm rode: ${f.chainLengthM} m of chain at the anchor, then ${f.nylonLengthM} m of nylon, the stretchy part. With that much nylon in the rode we size chain, nylon and shackle at ${Math.round(SHOCK_REDUCTION_FACTOR * 100)} % of the table load (Rodewise's assumption, below the 50–70 % peak cuts measured for long snubbers, Practical Sailor 2016); the anchor takes no credit.`,
    });
  if (nylon !== null)
    reasoning.push({
      topic: 'nylon',
      text:
        `${inchFractionLabel(nylon.sizeIn)} (${nylon.sizeMm} mm) nylon three-strand, or ${nylon.metricMm} mm metric rope: ` +
        `${nylon.governedBy === 'handbook-rule' ? 'the handbook rule for the anchor (0.2 in + anchor lb ÷ 185) governs' : `strength governs: wet breaking at least ${NYLON_ANCHORING_FACTOR} × the load`}; wet breaking ${kN(nylon.minBreakN)}, working limit ${kN(nylon.workingLimitN)}. ` +
        (nylon.role === 'alternative' ? 'Use this size if your rode is chain and rope. ' : '') +
        'The 49 CFR 393.108 tie-down rating of rope is a cargo rating and is not used for anchoring.',
    });
  reasoning.push({ topic: 'snubber', text: f.snubberBasis });
  if (shackle !== null && chain !== null)
    reasoning.push({
      topic: 'shackle',
      text: `${inchFractionLabel(shackle.nominalIn)} forged shackle: WLL ${kN(shackle.wllN)}, at least the chain's ${kN(chain.wllN)} (one rule: shackle WLL ≥ chain WLL, Boat Mechanical Systems Handbook; RR-C-271 table, from memory).`,
    });
  reasoning.push({
    topic: 'scope',
    text:
      `${f.ratio}:1 scope on ${f.heightM.toFixed(1)} m from seabed to bow roller at high water (depth ${f.depthM} m + bow ${f.bowHeightM} m + tide ${f.tideM} m): ${f.rodeLengthM} m of rode (ladder 5:1 most weather, 7:1 storms, 10:1 severe, Boat Mechanical Systems Handbook)` +
      (f.steppedUp
        ? `; stepped up from ${f.ladderRatio}:1 so the chain does not lift the anchor more than ${UPLIFT_WARN_DEG}°.`
        : '.'),
  });
  if (shape !== null)
    reasoning.push({
      topic: 'uplift',
      text: `At ${windKn} kn the pull at the anchor is ${shape.anchorAngleDeg.toFixed(1)}° above the seabed with ${shape.onBottomM.toFixed(1)} m of chain lying on it (catenary after MIT 2.019). We warn above ${UPLIFT_WARN_DEG}° (from memory): beyond that a drag anchor starts to lose holding.`,
    });
  return reasoning;
}
