import { CHAIN_GRADE_LABELS, inchFractionLabel, nylonChoiceLabel } from '@app/calc';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Quantity } from '../../units/components/quantity';
import type { Recommendation } from '../utils/recommend';

export interface RecommendationColumnProps {
  title: string;
  rec: Recommendation;
  onSave: () => void;
  isSaving: boolean;
}

const times = (value: number) => `${value.toFixed(2)} ×`;

/** One wind's suggested anchor, chain, rode and snubber with their margins and warnings. */
export function RecommendationColumn({ title, rec, onSave, isSaving }: RecommendationColumnProps) {
  const { load, anchor, rode, snubber, chainMargin } = rec;
  return (
    <section
      aria-label={title}
      className="flex min-w-0 flex-col gap-3 rounded-lg border border-sand-300 bg-sand-50 p-4 shadow-card"
    >
      <h3 className="text-lg">{title}</h3>
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-2 text-sm">
        <dt className="font-bold">Design load</dt>
        <dd>
          <Quantity value={load.loadN} kind="force" />
          {load.extrapolated && ' (extrapolated)'}
        </dd>
        <dt className="font-bold">Anchor</dt>
        <dd>
          {rec.anchorType} of <Quantity value={anchor.suggestedKg} kind="mass" /> (model minimum{' '}
          <Quantity value={anchor.minKg} kind="mass" />)
        </dd>
        <dt className="font-bold">Chain</dt>
        <dd>
          {rode.chain ? (
            <>
              {inchFractionLabel(rode.chain.tradeSizeIn)} {CHAIN_GRADE_LABELS[rode.chain.grade]},
              WLL <Quantity value={rode.chain.wllN} kind="force" />
              {chainMargin && (
                <span className="block text-ink-700">
                  margin {times(chainMargin.wll)} on WLL, {times(chainMargin.breaking)} on breaking
                </span>
              )}
            </>
          ) : (
            'none in the table carries this load'
          )}
        </dd>
        <dt className="font-bold">Nylon rode</dt>
        <dd>
          {rode.nylon
            ? `${nylonChoiceLabel(rode.nylon)} three-strand`
            : 'none up to 1 in is enough'}
        </dd>
        <dt className="font-bold">Snubber</dt>
        <dd>
          {inchFractionLabel(snubber.sizeIn)} nylon,{' '}
          <Quantity value={snubber.lengthM} kind="length" /> long
          <span className="block text-ink-700">
            stretches about <Quantity value={snubber.stretchM} kind="length" /> at the load
          </span>
        </dd>
      </dl>
      {rec.warnings.length > 0 && (
        <Alert tone="warning" title="Check these">
          <ul className="list-disc pl-5">
            {rec.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Alert>
      )}
      <details className="text-xs text-ink-700">
        <summary className="cursor-pointer font-bold">Basis and sources</summary>
        <p className="mt-1">{load.basis}</p>
        <p className="mt-1">{anchor.basis}</p>
        <p className="mt-1">{rode.basis}</p>
        <p className="mt-1">{snubber.basis}</p>
      </details>
      <Button
        onClick={onSave}
        isPending={isSaving}
        pendingLabel="Saving…"
        className="mt-auto self-start"
      >
        Save as plan
      </Button>
    </section>
  );
}
