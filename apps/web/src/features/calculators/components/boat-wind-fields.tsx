import { QuantityField } from '@/components/units/quantity-field';
import { ChoiceField } from '@/components/ui/choice-field';
import { HULL_OPTIONS } from '../utils/options';
import type { BoatWind } from '../utils/boat-wind';
import { fieldError, type CalcOutcome } from '../utils/run-calc';

export interface BoatWindFieldsProps {
  value: BoatWind;
  onChange: (value: BoatWind) => void;
  outcome: CalcOutcome<unknown>;
  /** Field-path prefix the calculation uses for these inputs ('' or 'boat'). */
  prefix?: string;
}

/** LOA, beam, hull and wind, each showing the calculation's complaint about it. */
export function BoatWindFields({ value, onChange, outcome, prefix = '' }: BoatWindFieldsProps) {
  const path = (f: string) => (prefix ? `${prefix}.${f}` : f);
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <QuantityField
        label="Length overall (LOA)"
        kind="length"
        value={value.loaM}
        onValueChange={(loaM) => onChange({ ...value, loaM })}
        error={fieldError(outcome, path('loaM'))}
      />
      <QuantityField
        label="Beam (optional)"
        kind="length"
        value={value.beamM}
        onValueChange={(beamM) => onChange({ ...value, beamM })}
        error={fieldError(outcome, path('beamM'))}
      />
      <ChoiceField
        label="Hull"
        options={HULL_OPTIONS}
        value={value.hull}
        onChoose={(hull) => onChange({ ...value, hull })}
        error={fieldError(outcome, path('hull'))}
      />
      <QuantityField
        label="Design wind"
        kind="speed"
        value={value.windKn}
        onValueChange={(windKn) => onChange({ ...value, windKn })}
        error={fieldError(outcome, path('windKn'))}
      />
    </div>
  );
}
