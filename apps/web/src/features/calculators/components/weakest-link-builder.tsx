import { STANDARD_CAUTIONS, weakestLink } from '@app/calc';
import { useState } from 'react';
import { useConditions, useLinkedState } from '../utils/conditions';
import { LinkedNote } from './linked-note';
import { Button } from '@/components/ui/button';
import { QuantityField } from '@/components/units/quantity-field';
import { ChoiceField } from '@/components/ui/choice-field';
import { newPart, ratePart, type LinkPart, type LinkPartKind } from '../utils/link-parts';
import { fieldError, runCalc } from '../utils/run-calc';
import { CalcCard } from './calc-card';
import { LinkPartEditor } from './link-part-editor';
import { NoResult, WarningList } from './result-list';
import { WeakestLinkTable } from './weakest-link-table';

const KIND_OPTIONS: readonly { value: LinkPartKind; label: string }[] = [
  { value: 'chain', label: 'chain' },
  { value: 'shackle', label: 'shackle' },
  { value: 'rope', label: 'rope' },
  { value: 'custom', label: "other fitting (maker's ratings)" },
];

interface Row {
  id: number;
  part: LinkPart;
}

let nextRowId = 1;
const row = (kind: LinkPartKind): Row => ({ id: nextRowId++, part: newPart(kind) });

/** Add the parts of a rode, see each one's margins and which breaks first. */
export function WeakestLinkBuilder() {
  const shared = useConditions();
  const linked = useLinkedState({ loadN: shared.loadN }, { loadN: shared.loadN });
  const { loadN } = linked.value;
  const setLoadN = (next: number | undefined) => linked.set({ loadN: next });
  const [rows, setRows] = useState<Row[]>(() => [row('chain'), row('shackle')]);
  const [addKind, setAddKind] = useState<LinkPartKind>('shackle');

  const rated = rows.map((r, i) => runCalc(() => ratePart(r.part, i)));
  const parts = rated.flatMap((o) => (o.ok ? [o.value] : []));
  const allRated = rated.every((o) => o.ok);
  const outcome = runCalc(() =>
    loadN === undefined || !allRated || parts.length === 0
      ? null
      : weakestLink({ loadN, components: parts }),
  );
  const result = outcome.ok ? outcome.value : null;
  const update = (id: number, part: LinkPart) =>
    setRows((list) => list.map((r) => (r.id === id ? { ...r, part } : r)));

  return (
    <CalcCard
      title="Weakest-link check"
      intro="Add each part between anchor and boat; the rode is only as strong as its weakest part."
      basis={result?.basis}
      source="49 CFR 393.108(a): an assembly's working load limit is its weakest part's (seen); ratings from the chain, shackle and rope tables or the maker."
      assumptions={[
        'The whole load passes through every part listed.',
        'Rope is rated wet; a splice or knot is not included unless you add it as a part.',
        'Design factor 4 on breaking strength (common practice).',
      ]}
      cautions={result?.cautions ?? STANDARD_CAUTIONS}
    >
      <QuantityField
        label="Load through the rode"
        kind="force"
        value={loadN}
        onValueChange={setLoadN}
        hint="The design load of the boat and wind at the top, or type another, e.g. 3.2 kN or 720 lbf"
        error={fieldError(outcome, 'loadN')}
      />
      <LinkedNote own={linked.own} onFollow={linked.follow} what="design load" />
      <ol className="flex flex-col gap-3">
        {rows.map((r, i) => {
          const o = rated[i];
          return (
            <li key={r.id} className="flex flex-col gap-2 rounded-md border border-sand-300 p-3">
              <div className="flex items-center justify-between gap-2">
                <p className="font-bold">
                  Part {i + 1}: {r.part.kind === 'custom' ? 'other fitting' : r.part.kind}
                </p>
                <Button
                  variant="ghost"
                  size="sm"
                  onClick={() => setRows((list) => list.filter((x) => x.id !== r.id))}
                  aria-label={`Remove part ${i + 1}`}
                >
                  Remove
                </Button>
              </div>
              <LinkPartEditor
                name={`Part ${i + 1}`}
                part={r.part}
                onChange={(part) => update(r.id, part)}
                error={o && !o.ok ? o.message : undefined}
              />
            </li>
          );
        })}
      </ol>
      <div className="flex flex-wrap items-end gap-3">
        <ChoiceField
          label="Part to add"
          options={KIND_OPTIONS}
          value={addKind}
          onChoose={setAddKind}
        />
        <Button variant="secondary" onClick={() => setRows((list) => [...list, row(addKind)])}>
          Add part
        </Button>
      </div>
      {result ? (
        <>
          <WeakestLinkTable parts={parts} result={result} />
          <WarningList warnings={result.warnings} />
        </>
      ) : (
        <NoResult
          message={
            rows.length === 0
              ? 'Add at least one part.'
              : !outcome.ok
                ? outcome.message
                : 'Enter the load and complete every part to see the margins.'
          }
        />
      )}
    </CalcCard>
  );
}
