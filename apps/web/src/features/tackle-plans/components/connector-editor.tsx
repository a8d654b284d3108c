import { CONNECTOR_KIND_LABELS, SHACKLE_SIZES_IN, inchFractionLabel } from '@app/calc';
import type { PlanComponents } from '@app/shared';
import { CONNECTOR_KINDS } from '@app/shared/values';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { QuantityField } from '@/components/units/quantity-field';
import { SelectField } from '@/components/ui/select-field';

export type PlanConnectorInput = PlanComponents['connectors'][number];

export interface ConnectorEditorProps {
  connectors: readonly PlanConnectorInput[];
  /** Saves the whole new list; rejects with the server's message. */
  onSave: (connectors: PlanConnectorInput[]) => Promise<unknown>;
  isPending: boolean;
  error?: string;
}

type Kind = (typeof CONNECTOR_KINDS)[number];

/**
 * The fittings between anchor and boat: add a shackle by size (rated from the shackle table) or any
 * fitting with the maker's working load limit and breaking strength, or remove one.
 */
export function ConnectorEditor({ connectors, onSave, isPending, error }: ConnectorEditorProps) {
  const [kind, setKind] = useState<Kind>('shackle');
  const [label, setLabel] = useState('anchor shackle');
  const [nominalIn, setNominalIn] = useState(7 / 16);
  const [wllN, setWllN] = useState<number | undefined>(undefined);
  const [minBreakN, setMinBreakN] = useState<number | undefined>(undefined);
  const [problem, setProblem] = useState<string | undefined>(undefined);

  const add = () => {
    if (label.trim() === '') return setProblem('Name the fitting, e.g. "anchor shackle".');
    const rated = kind === 'shackle' && wllN === undefined && minBreakN === undefined;
    if (!rated && kind !== 'splice' && wllN === undefined && minBreakN === undefined) {
      return setProblem("Enter the maker's working load limit or breaking strength.");
    }
    setProblem(undefined);
    const connector: PlanConnectorInput = {
      label: label.trim(),
      kind,
      ...(kind === 'shackle' ? { nominalIn } : {}),
      ...(wllN === undefined ? {} : { wllN }),
      ...(minBreakN === undefined ? {} : { minBreakN }),
    };
    void onSave([...connectors, connector]).catch(() => undefined);
  };

  return (
    <div className="flex flex-col gap-3">
      {connectors.length > 0 && (
        <ul className="flex flex-col gap-2">
          {connectors.map((c, i) => (
            <li
              key={`${c.label}-${i}`}
              className="flex items-center justify-between gap-2 rounded-md border border-sand-300 px-3 py-1"
            >
              <span>
                {c.label} ({CONNECTOR_KIND_LABELS[c.kind]}
                {c.nominalIn !== undefined ? `, ${inchFractionLabel(c.nominalIn)}` : ''})
              </span>
              <Button
                variant="ghost"
                size="sm"
                aria-label={`Remove ${c.label}`}
                disabled={isPending}
                onClick={() =>
                  void onSave(connectors.filter((_, j) => j !== i)).catch(() => undefined)
                }
              >
                Remove
              </Button>
            </li>
          ))}
        </ul>
      )}
      <FormError message={problem ?? error} />
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField
          label="Fitting"
          options={CONNECTOR_KINDS.map((k) => ({ value: k, label: CONNECTOR_KIND_LABELS[k] }))}
          value={kind}
          onChange={(e) => setKind(CONNECTOR_KINDS.find((k) => k === e.target.value) ?? 'shackle')}
        />
        <TextField
          label="Fitting name"
          value={label}
          maxLength={60}
          onChange={(e) => setLabel(e.target.value)}
        />
        {kind === 'shackle' && (
          <SelectField
            label="Shackle size"
            options={SHACKLE_SIZES_IN.map((s) => ({
              value: String(s),
              label: inchFractionLabel(s),
            }))}
            value={String(nominalIn)}
            onChange={(e) => setNominalIn(Number(e.target.value))}
            hint="Rated from the shackle table unless you enter the maker's figures"
          />
        )}
        <QuantityField
          label="Maker's working load limit (optional)"
          kind="force"
          value={wllN}
          onValueChange={setWllN}
        />
        <QuantityField
          label="Maker's breaking strength (optional)"
          kind="force"
          value={minBreakN}
          onValueChange={setMinBreakN}
        />
      </div>
      <Button
        variant="secondary"
        onClick={add}
        isPending={isPending}
        pendingLabel="Saving…"
        className="self-start"
      >
        Add fitting
      </Button>
    </div>
  );
}
