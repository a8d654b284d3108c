import type { BoatDto } from '@app/shared';
import { useId, useState } from 'react';
import { ChoiceField } from '@/components/ui/choice-field';
import { SelectField } from '@/components/ui/select-field';
import { Quantity } from '@/components/units/quantity';
import { QuantityField } from '@/components/units/quantity-field';
import type { QuantityKind } from '@/lib/units/parse-quantity';
import { BOTTOM_OPTIONS, HULL_OPTIONS } from '../utils/options';
import { conditionsFromBoat, useConditions, type CalcConditions } from '../utils/conditions';

type FigureKey = 'loaM' | 'beamM' | 'windKn' | 'depthM' | 'bowHeightM' | 'tideM';

/**
 * The boat and conditions at the top of the calculators page: pick a saved boat or type one. Every calculator
 * below starts from these values, and shows when it has been given its own.
 */
export function ConditionsBlock({ boats = [] }: { boats?: readonly BoatDto[] }) {
  const { conditions: c, setConditions, loadN } = useConditions();
  const [boatId, setBoatId] = useState('');
  const headingId = useId();
  const set = (patch: Partial<CalcConditions>) => {
    setConditions({ ...c, ...patch });
    // Typing over a boat's own figures means it is no longer that boat.
    if ('loaM' in patch || 'beamM' in patch || 'hull' in patch || 'bowHeightM' in patch)
      setBoatId('');
  };
  const figure = (key: FigureKey, label: string, kind: QuantityKind) => (
    <QuantityField
      label={label}
      kind={kind}
      value={c[key]}
      onValueChange={(value) => set({ [key]: value })}
    />
  );
  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-lg border-2 border-signal-600 bg-white p-4 sm:p-5"
    >
      <header className="flex flex-col gap-1">
        <h2 id={headingId} className="text-xl">
          Your boat and conditions
        </h2>
        <p className="text-sm text-ink-700">
          Every calculator below starts from these figures. Change a figure inside a calculator to
          try something else there only.
        </p>
      </header>
      {boats.length > 0 && (
        <SelectField
          label="Start from one of your boats"
          options={[
            { value: '', label: 'Type the boat in' },
            ...boats.map((b) => ({ value: String(b.id), label: b.name })),
          ]}
          value={boatId}
          onChange={(e) => {
            const boat = boats.find((b) => String(b.id) === e.target.value);
            setBoatId(boat ? String(boat.id) : '');
            if (boat) setConditions(conditionsFromBoat(c, boat));
          }}
        />
      )}
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        {figure('loaM', 'Length overall (LOA)', 'length')}
        {figure('beamM', 'Beam (optional)', 'length')}
        <ChoiceField
          label="Hull"
          options={HULL_OPTIONS}
          value={c.hull}
          onChoose={(hull) => set({ hull })}
        />
        {figure('windKn', 'Design wind', 'speed')}
        {figure('depthM', 'Depth where you anchor', 'length')}
        {figure('bowHeightM', 'Bow roller above water', 'length')}
        {figure('tideM', 'Tide range', 'length')}
        <ChoiceField
          label="Seabed"
          options={BOTTOM_OPTIONS}
          value={c.bottom}
          onChoose={(bottom) => set({ bottom })}
        />
      </div>
      <p className="text-base" aria-live="polite">
        {loadN === undefined ? (
          'Enter the length overall and the design wind to see the design load.'
        ) : (
          <>
            Design load on the rode: <Quantity value={loadN} kind="force" />{' '}
            <span className="text-sm text-ink-700">(ABYC H-40 table, values from memory)</span>
          </>
        )}
      </p>
    </section>
  );
}
