import { cn } from '@/lib/cn';
import { formatQuantity, otherSystem } from '@/lib/units/format-quantity';
import type { QuantityKind } from '@/lib/units/parse-quantity';
import { useUnits } from '@/lib/units/use-units';

export interface QuantityProps {
  /** In the kind's base unit: m, kg, N or kn. */
  value: number;
  kind: QuantityKind;
  className?: string;
}

/**
 * A figure in the chosen units; the other system shows on hover (title) and is read out to screen
 * readers after it, so both are always available.
 */
export function Quantity({ value, kind, className }: QuantityProps) {
  const { system } = useUnits();
  if (!Number.isFinite(value)) return <span className={className}>—</span>;
  const shown = formatQuantity(value, kind, system);
  const other = formatQuantity(value, kind, otherSystem(system));
  if (other === shown) return <span className={className}>{shown}</span>;
  return (
    <span
      title={other}
      className={cn(
        'cursor-help underline decoration-sand-500 decoration-dotted print:no-underline',
        className,
      )}
    >
      {shown}
      <span className="sr-only"> ({other})</span>
    </span>
  );
}
