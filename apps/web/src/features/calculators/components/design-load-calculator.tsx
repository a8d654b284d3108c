import { designLoad, STANDARD_CAUTIONS } from '@app/calc';
import { useState } from 'react';
import { useConditions, useLinkedState } from '../utils/conditions';
import { LinkedNote } from './linked-note';
import { Quantity } from '@/components/units/quantity';
import { runCalc } from '../utils/run-calc';
import { DEFAULT_BOAT_WIND, type BoatWind } from '../utils/boat-wind';
import { BoatWindFields } from './boat-wind-fields';
import { CalcCard } from './calc-card';
import { NoResult, ResultList } from './result-list';

const MISSING = 'Enter the length overall and the design wind to see the load.';

/** Horizontal load on the rode for a boat and a wind (ABYC H-40 table). */
export function DesignLoadCalculator() {
  const { conditions } = useConditions();
  const linked = useLinkedState<BoatWind, keyof BoatWind>(DEFAULT_BOAT_WIND, {
    loaM: conditions.loaM,
    beamM: conditions.beamM,
    hull: conditions.hull,
    windKn: conditions.windKn,
  });
  const boat = linked.value;
  const [extrapolate, setExtrapolate] = useState(false);
  const { loaM, beamM, hull, windKn } = boat;
  const outcome = runCalc(() =>
    loaM === undefined || windKn === undefined
      ? null
      : designLoad({ loaM, hull, windKn, extrapolate, ...(beamM === undefined ? {} : { beamM }) }),
  );
  const result = outcome.ok ? outcome.value : null;
  return (
    <CalcCard
      title="Design load"
      intro="The steady pull of a boat lying to its anchor, the figure every other part is sized from."
      basis={result?.basis}
      source="ABYC H-40 table of horizontal design loads (values from memory); entry by length or beam after Gerr (seen)."
      assumptions={[
        'One anchor, moderate sea, boat lying head to wind.',
        'Load grows with the square of wind speed between and beyond the 15, 30 and 42 kn columns.',
        'Multihulls: sailboat row × 1.5 (common practice, approximate).',
      ]}
      cautions={result?.cautions ?? STANDARD_CAUTIONS}
    >
      <LinkedNote own={linked.own} onFollow={linked.follow} />
      <BoatWindFields value={boat} onChange={linked.set} outcome={outcome} />
      <label className="flex min-h-11 items-center gap-3 text-sm">
        <input
          type="checkbox"
          checked={extrapolate}
          onChange={(e) => setExtrapolate(e.target.checked)}
          className="size-5 accent-signal-600"
        />
        Allow boats beyond the 10–60 ft table (flagged as an extrapolation)
      </label>
      {result ? (
        <ResultList
          label="Design load results"
          items={[
            { label: 'Horizontal load', value: <Quantity value={result.loadN} kind="force" /> },
            {
              label: 'Table row used',
              value: `${result.rowLoaFt.toFixed(1)} ft LOA equivalent, by ${result.governedBy === 'beam' ? 'beam' : 'length'}`,
            },
            {
              label: 'Standing',
              value: result.extrapolated
                ? 'extrapolated beyond the table'
                : result.approximate
                  ? 'approximate'
                  : 'within the table',
            },
          ]}
        />
      ) : (
        <NoResult message={outcome.ok ? MISSING : outcome.message} />
      )}
    </CalcCard>
  );
}
