import {
  ANCHOR_TYPE_LABELS,
  CHAIN_GRADE_LABELS,
  inchFractionLabel,
  type TackleRecommendation,
} from '@app/calc';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Quantity } from '@/components/units/quantity';
import { RecommendationReasoning } from './recommendation-reasoning';

export interface RecommendationColumnProps {
  title: string;
  rec: TackleRecommendation;
  /** Omit for a read-only column (the plan page). */
  onSave?: () => void;
  isSaving?: boolean;
}

const times = (value: number) => `${value.toFixed(2)} ×`;

/** One wind's anchor, chain, nylon, snubber and shackle with their margins, warnings and reasoning. */
export function RecommendationColumn({ title, rec, onSave, isSaving }: RecommendationColumnProps) {
  const { designLoad: load, anchor, chain, nylon, snubber, shackle } = rec;
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
          {load.governedBy === 'beam' && (
            <span className="block text-ink-700">table entered by beam</span>
          )}
        </dd>
        <dt className="font-bold">Anchor</dt>
        <dd>
          {anchor.massKg === null ? (
            'no mass on this seabed: see the warnings'
          ) : (
            <>
              {ANCHOR_TYPE_LABELS[anchor.type]} of <Quantity value={anchor.massKg} kind="mass" />
              <span className="block text-ink-700">
                holds {rec.sizingKn} kn
                {anchor.softMud && (
                  <>
                    ; in soft mud <Quantity value={anchor.softMud.suggestedKg} kind="mass" />
                  </>
                )}
              </span>
            </>
          )}
        </dd>
        <dt className="font-bold">Chain</dt>
        <dd>
          {chain ? (
            <>
              {inchFractionLabel(chain.tradeSizeIn)} ({chain.nominalMm} mm){' '}
              {CHAIN_GRADE_LABELS[chain.grade]}, <Quantity value={chain.lengthM} kind="length" />
              <span className="block text-ink-700">
                WLL <Quantity value={chain.wllN} kind="force" />, {times(chain.marginOnWll)} the
                load it is sized for
              </span>
            </>
          ) : (
            'none in the table carries this load'
          )}
        </dd>
        <dt className="font-bold">
          {nylon?.role === 'storm-rode' ? 'Nylon rode' : 'If chain and rope'}
        </dt>
        <dd>
          {nylon ? (
            <>
              {inchFractionLabel(nylon.sizeIn)} ({nylon.sizeMm} mm) nylon three-strand
              {nylon.role === 'storm-rode' && (
                <>
                  , <Quantity value={nylon.lengthM} kind="length" /> spliced to the chain
                </>
              )}
              <span className="block text-ink-700">metric: {nylon.metricMm} mm</span>
            </>
          ) : (
            'none up to 1 in is enough'
          )}
        </dd>
        <dt className="font-bold">Snubber</dt>
        <dd>
          {inchFractionLabel(snubber.sizeIn)} ({snubber.diameterMm} mm) nylon,{' '}
          <Quantity value={snubber.lengthM} kind="length" /> long
          {snubber.bridle && <span className="block text-ink-700">rig two, or a bridle</span>}
        </dd>
        <dt className="font-bold">Shackle</dt>
        <dd>
          {shackle ? (
            <>
              {inchFractionLabel(shackle.nominalIn)} forged, WLL{' '}
              <Quantity value={shackle.wllN} kind="force" />
            </>
          ) : (
            'a rated connector of at least the chain’s WLL'
          )}
        </dd>
        <dt className="font-bold">Scope</dt>
        <dd>
          {rec.scope.ratio} : 1, <Quantity value={rec.scope.rodeLengthM} kind="length" /> of rode
          {rec.catenary && (
            <span className="block text-ink-700">
              pull at the anchor {rec.catenary.anchorAngleDeg.toFixed(1)}°
            </span>
          )}
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
      <RecommendationReasoning rec={rec} open={onSave === undefined} />
      {onSave && (
        <Button
          onClick={onSave}
          isPending={isSaving ?? false}
          pendingLabel="Saving…"
          className="mt-auto self-start"
        >
          Save as plan
        </Button>
      )}
    </section>
  );
}
