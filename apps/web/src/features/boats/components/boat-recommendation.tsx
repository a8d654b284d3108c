import { ANCHOR_TYPE_LABELS, ANCHOR_TYPES, STANDARD_CAUTIONS, type AnchorType } from '@app/calc';
import type { BoatDto, PlanComponents, PlanCondition } from '@app/shared';
import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { QuantityField } from '@/components/units/quantity-field';
import { SelectField } from '@/components/ui/select-field';
import { recommendedComponents, recommendFor } from '../utils/recommend';
import { RecommendationColumn } from './recommendation-column';

/** What "Save as plan" hands to the screen, which creates the plan. */
export interface PlanDraft {
  name: string;
  condition: PlanCondition;
  windKn: number;
  depthM: number;
  tideM: number;
  components: PlanComponents;
}

export interface BoatRecommendationProps {
  boat: BoatDto;
  onSavePlan: (draft: PlanDraft) => void;
  /** The wind whose plan is being saved, if any. */
  savingWindKn?: number;
}

const WINDS = [
  { windKn: 30, title: 'Everyday: 30 kn', condition: 'everyday', name: 'Everyday, 30 kn' },
  { windKn: 60, title: 'Storm: 60 kn', condition: 'storm', name: 'Storm, 60 kn' },
  {
    windKn: 70,
    title: 'Hurricane hole: 70 kn',
    condition: 'hurricane-hole',
    name: 'Hurricane hole, 70 kn',
  },
] as const;

/** The suggested ground tackle for the boat at 30, 60 and 70 kn, side by side, with cautions. */
export function BoatRecommendation({ boat, onSavePlan, savingWindKn }: BoatRecommendationProps) {
  const [anchorType, setAnchorType] = useState<AnchorType>('plow');
  const [depthM, setDepthM] = useState<number | undefined>(6);
  const [tideM, setTideM] = useState<number | undefined>(0);
  const depthError =
    depthM === undefined
      ? 'Enter the depth you usually anchor in'
      : depthM < 0.5 || depthM > 100
        ? 'Depth must be 0.5–100 m'
        : undefined;
  const tideError =
    tideM !== undefined && (tideM < 0 || tideM > 15) ? 'Tidal rise must be 0–15 m' : undefined;
  const where = { depthM: depthError ? 6 : (depthM ?? 6), tideM: tideError ? 0 : (tideM ?? 0) };
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-3 sm:grid-cols-3">
        <SelectField
          label="Anchor type"
          options={ANCHOR_TYPES.map((t) => ({ value: t, label: ANCHOR_TYPE_LABELS[t] }))}
          value={anchorType}
          onChange={(e) => setAnchorType(ANCHOR_TYPES.find((t) => t === e.target.value) ?? 'plow')}
        />
        <QuantityField
          label="Depth for the plan"
          kind="length"
          value={depthM}
          onValueChange={setDepthM}
          hint="Low-water depth: sets the rode length (5:1 in light weather, 7:1 from 25 kn, 10:1 in severe storms)"
          error={depthError}
        />
        <QuantityField
          label="Tidal rise to come"
          kind="length"
          value={tideM}
          onValueChange={setTideM}
          hint="Added to the depth for the rode length (plus any surge in a storm)"
          error={tideError}
        />
      </div>
      <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3" data-testid="recommendations">
        {WINDS.map((w) => {
          const outcome = recommendFor(boat, w.windKn, anchorType, where);
          if (!outcome.ok) {
            return (
              <Alert key={w.windKn} tone="error" title={`${w.title}: cannot size this boat`}>
                <p>{outcome.message}</p>
              </Alert>
            );
          }
          return (
            <RecommendationColumn
              key={w.windKn}
              title={w.title}
              rec={outcome.value}
              isSaving={savingWindKn === w.windKn}
              onSave={() => {
                if (depthM === undefined || depthError || tideError) return;
                onSavePlan({
                  name: w.name,
                  condition: w.condition,
                  windKn: w.windKn,
                  depthM,
                  tideM: tideM ?? 0,
                  components: recommendedComponents(outcome.value),
                });
              }}
            />
          );
        })}
      </div>
      <Alert tone="warning" title="Before you rely on it">
        <ul className="list-disc pl-5">
          {STANDARD_CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
          <li>
            Storm preparation also means chafe gear, a second anchor and a safe harbour: ask local,
            qualified professionals.
          </li>
        </ul>
      </Alert>
    </div>
  );
}
