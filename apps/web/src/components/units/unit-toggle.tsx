import { UNIT_SYSTEMS, type UnitSystem } from '@app/calc';
import { useId } from 'react';
import { cn } from '@/lib/cn';
import { useUnits } from '@/lib/units/use-units';

const LABELS: Record<UnitSystem, string> = { metric: 'Metric', imperial: 'Imperial' };

/** Two radio buttons styled as a switch: the units every figure on the screen is shown in. */
export function UnitToggle({ className }: { className?: string }) {
  const { system, setSystem } = useUnits();
  const name = useId();
  return (
    <fieldset className={cn('flex items-center gap-2 print:hidden', className)}>
      <legend className="sr-only">Units</legend>
      <span aria-hidden="true" className="text-sm font-bold text-ink-700">
        Units
      </span>
      <div className="inline-flex rounded-pill border border-sand-500 bg-sand-50 p-0.5">
        {UNIT_SYSTEMS.map((option) => (
          <label
            key={option}
            className={cn(
              'flex min-h-9 cursor-pointer items-center rounded-pill px-3 text-sm font-bold',
              'has-[:focus-visible]:outline has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-signal-600',
              system === option ? 'bg-ink-900 text-sand-50' : 'text-ink-800 hover:bg-sand-200',
            )}
          >
            <input
              type="radio"
              name={name}
              value={option}
              checked={system === option}
              onChange={() => setSystem(option)}
              className="sr-only"
            />
            {LABELS[option]}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
