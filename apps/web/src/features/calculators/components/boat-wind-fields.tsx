import { HULL_TYPES } from '@app/calc';
import { QuantityField } from '@/components/units/quantity-field';
import { SelectField } from '@/components/ui/select-field';
import { HULL_OPTIONS, pick } from '../utils/options';
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
      <SelectField
        label="Hull"
        options={HULL_OPTIONS}
        value={value.hull}
        onChange={(e) => onChange({ ...value, hull: pick(e.target.value, HULL_TYPES, 'sail') })}
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
