import { BOTTOM_TYPES, HULL_TYPES } from '@app/calc';
import type { BoatDto } from '@app/shared';
import { useId, useState } from 'react';
import { SelectField } from '@/components/ui/select-field';
import { Quantity } from '@/components/units/quantity';
import { QuantityField } from '@/components/units/quantity-field';
import { BOTTOM_OPTIONS, HULL_OPTIONS, pick } from '../utils/options';
import { conditionsFromBoat, useConditions, type CalcConditions } from '../utils/conditions';

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
        <QuantityField
          label="Length overall (LOA)"
          kind="length"
          value={c.loaM}
          onValueChange={(loaM) => set({ loaM })}
        />
        <QuantityField
          label="Beam (optional)"
          kind="length"
          value={c.beamM}
          onValueChange={(beamM) => set({ beamM })}
        />
        <SelectField
          label="Hull"
          options={HULL_OPTIONS}
          value={c.hull}
          onChange={(e) => set({ hull: pick(e.target.value, HULL_TYPES, 'sail') })}
        />
        <QuantityField
          label="Design wind"
          kind="speed"
          value={c.windKn}
          onValueChange={(windKn) => set({ windKn })}
        />
        <QuantityField
          label="Depth where you anchor"
          kind="length"
          value={c.depthM}
          onValueChange={(depthM) => set({ depthM })}
        />
        <QuantityField
          label="Bow roller above water"
          kind="length"
          value={c.bowHeightM}
          onValueChange={(bowHeightM) => set({ bowHeightM })}
        />
        <QuantityField
          label="Tide range"
          kind="length"
          value={c.tideM}
          onValueChange={(tideM) => set({ tideM })}
        />
        <SelectField
          label="Seabed"
          options={BOTTOM_OPTIONS}
          value={c.bottom}
          onChange={(e) =>
            set({ bottom: e.target.value === '' ? '' : pick(e.target.value, BOTTOM_TYPES, 'sand') })
          }
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
