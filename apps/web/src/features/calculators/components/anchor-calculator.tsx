import {
  BOTTOM_TYPE_LABELS,
  STANDARD_CAUTIONS,
  anchorSuggestion,
  type AnchorType,
  type BottomType,
} from '@app/calc';
import { useState } from 'react';
import { useConditions, useLinkedState } from '../utils/conditions';
import { LinkedNote } from './linked-note';
import { Quantity } from '@/components/units/quantity';
import { ChoiceField } from '@/components/ui/choice-field';
import { ANCHOR_OPTIONS, BOTTOM_OPTIONS } from '../utils/options';
import { runCalc } from '../utils/run-calc';
import { DEFAULT_BOAT_WIND, type BoatWind } from '../utils/boat-wind';
import { BoatWindFields } from './boat-wind-fields';
import { CalcCard } from './calc-card';
import { NoResult, ResultList } from './result-list';

/** The anchor mass our holding model gives for a boat, a wind, an anchor type and a seabed. */
export function AnchorCalculator() {
  const { conditions } = useConditions();
  const linked = useLinkedState<BoatWind & { bottom: BottomType | '' }, keyof BoatWind | 'bottom'>(
    { ...DEFAULT_BOAT_WIND, bottom: '' },
    {
      loaM: conditions.loaM,
      beamM: conditions.beamM,
      hull: conditions.hull,
      windKn: conditions.windKn,
      bottom: conditions.bottom,
    },
  );
  const { bottom, ...boat } = linked.value;
  const setBottom = (next: BottomType | '') => linked.set({ bottom: next });
  const [anchorType, setAnchorType] = useState<AnchorType>('plow');
  const { loaM, beamM, hull, windKn } = boat;
  const outcome = runCalc(() =>
    loaM === undefined || windKn === undefined
      ? null
      : anchorSuggestion({
          loaM,
          hull,
          windKn,
          anchorType,
          extrapolate: true,
          ...(beamM === undefined ? {} : { beamM }),
          ...(bottom === '' ? {} : { bottom }),
        }),
  );
  const r = outcome.ok ? outcome.value : null;
  return (
    <CalcCard
      title="Anchor suggestion"
      intro="A starting mass for an anchor of a given type, from the design load and a drag-anchor holding curve: the same model as your boat's recommendation."
      basis={r?.basis}
      source="Design load from the ABYC H-40 table (from memory); holding as a power law of anchor mass, the form of UFC 4-159-03 eq. 26 (small-craft figures from memory, calibrated to handbook examples and practice)."
      assumptions={[
        'A well-set anchor at a scope of 5:1 or more.',
        'Minimum: holds the load at your wind. Suggested: holds it at 42 kn or your wind if higher, because a working anchor must survive a squall.',
        'No seabed chosen: firm mud or mixed, with soft mud shown beside it.',
        "An anchor maker's sizing chart for your boat takes precedence.",
      ]}
      cautions={r?.cautions ?? STANDARD_CAUTIONS}
    >
      <LinkedNote own={linked.own} onFollow={linked.follow} />
      <BoatWindFields value={boat} onChange={(b) => linked.set(b)} outcome={outcome} />
      <div className="grid gap-3 sm:grid-cols-2">
        <ChoiceField
          label="Anchor type"
          options={ANCHOR_OPTIONS}
          value={anchorType}
          onChoose={setAnchorType}
        />
        <ChoiceField label="Seabed" options={BOTTOM_OPTIONS} value={bottom} onChoose={setBottom} />
      </div>
      {r && r.suggestedKg !== null && r.minKg !== null ? (
        <ResultList
          label="Anchor results"
          items={[
            {
              label: `Suggested mass (holds ${r.suggestedForKn} kn)`,
              value: <Quantity value={r.suggestedKg} kind="mass" />,
            },
            { label: 'Minimum by the model', value: <Quantity value={r.minKg} kind="mass" /> },
            ...(r.softMud
              ? [
                  {
                    label: 'In soft mud',
                    value: (
                      <>
                        <Quantity value={r.softMud.suggestedKg} kind="mass" /> suggested
                      </>
                    ),
                  },
                ]
              : []),
            { label: 'Design load', value: <Quantity value={r.loadN} kind="force" /> },
            { label: 'Seabed assumed', value: BOTTOM_TYPE_LABELS[r.bottomAssumed] },
          ]}
        />
      ) : r ? (
        <NoResult message={r.basis} />
      ) : (
        <NoResult
          message={outcome.ok ? 'Enter the length overall and the design wind.' : outcome.message}
        />
      )}
    </CalcCard>
  );
}
