import { useId } from 'react';

export interface BuddySelectProps {
  boatName: string;
  ownerId: number;
  value: number | null;
  people: ReadonlyArray<{ id: number; name: string }>;
  disabled?: boolean;
  onChange: (buddyUserId: number | null) => void;
}

/** Picks the member who checks on a boat (never its owner). */
export function BuddySelect({
  boatName,
  ownerId,
  value,
  people,
  disabled,
  onChange,
}: BuddySelectProps) {
  const id = useId();
  return (
    <>
      <label htmlFor={id} className="sr-only">
        Buddy for {boatName}
      </label>
      <select
        id={id}
        value={value === null ? '' : String(value)}
        disabled={disabled}
        onChange={(e) => onChange(e.target.value ? Number(e.target.value) : null)}
        className="min-h-11 rounded-md border border-sand-500 bg-sand-50 px-2 print:hidden"
      >
        <option value="">No buddy</option>
        {people
          .filter((p) => p.id !== ownerId)
          .map((p) => (
            <option key={p.id} value={String(p.id)}>
              {p.name}
            </option>
          ))}
      </select>
      <span className="hidden print:inline">{people.find((p) => p.id === value)?.name ?? '—'}</span>
    </>
  );
}
