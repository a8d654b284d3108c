import {
  ANCHOR_TYPE_LABELS,
  CHAIN_GRADE_LABELS,
  CONNECTOR_KIND_LABELS,
  inchFractionLabel,
} from '@app/calc';
import { Quantity } from '@/components/units/quantity';
import type { TacklePlanWithResult } from '../api/types';

const CONDITION_LABELS = {
  everyday: 'Everyday',
  storm: 'Storm',
  'hurricane-hole': 'Hurricane hole',
  custom: 'Custom',
} as const;

const times = (value: number) => `${value.toFixed(2)} ×`;

/** The one-page card to keep aboard: conditions, each part, the key figures and the cautions. */
export function TacklePlanCard({ data }: { data: TacklePlanWithResult }) {
  const { plan, boat, result } = data;
  const { anchor, chain, rode, snubber, nylonAlternative, connectors } = plan.components;
  const link = result.weakestLink;
  return (
    <article
      data-plan-card
      aria-label="Plan card"
      className="flex flex-col gap-3 rounded-lg border-2 border-ink-900 bg-white p-4 text-sm shadow-card sm:p-5"
    >
      <header className="flex flex-wrap items-baseline justify-between gap-2 border-b-2 border-ink-900 pb-2">
        <div>
          <p className="text-xs font-bold tracking-wide text-ink-600 uppercase">
            Ground-tackle card
          </p>
          <h2 className="text-xl">
            {boat.name}: {plan.name}
          </h2>
        </div>
        <p className="font-bold">
          {CONDITION_LABELS[plan.condition]} · <Quantity value={plan.windKn} kind="speed" /> · depth{' '}
          <Quantity value={plan.depthM} kind="length" />
          {plan.tideM > 0 && (
            <>
              {' '}
              + tide <Quantity value={plan.tideM} kind="length" />
            </>
          )}
        </p>
      </header>
      <div className="grid gap-3 sm:grid-cols-2 print:grid-cols-2">
        <section aria-label="Gear">
          <h3 className="mb-1 text-base">Gear</h3>
          <ul className="flex flex-col gap-1">
            {anchor && (
              <li>
                Anchor: {ANCHOR_TYPE_LABELS[anchor.type]},{' '}
                <Quantity value={anchor.massKg} kind="mass" />
              </li>
            )}
            {chain && (
              <li>
                Chain:{' '}
                {chain.tradeSizeIn !== undefined
                  ? inchFractionLabel(chain.tradeSizeIn)
                  : `${chain.nominalMm} mm`}{' '}
                {CHAIN_GRADE_LABELS[chain.grade]}, <Quantity value={chain.lengthM} kind="length" />
              </li>
            )}
            {rode && (
              <li>
                Rope rode: <Quantity value={rode.diameterMm / 1000} kind="diameter" />{' '}
                {rode.material} {rode.construction}, <Quantity value={rode.lengthM} kind="length" />
              </li>
            )}
            {snubber && (
              <li>
                {snubber.count === 2 ? 'Snubbers (rig two, or a bridle): ' : 'Snubber: '}
                <Quantity value={snubber.diameterMm / 1000} kind="diameter" /> {snubber.material},{' '}
                <Quantity value={snubber.lengthM} kind="length" />
                {snubber.count === 2 && ' each'}
              </li>
            )}
            {nylonAlternative && (
              <li>
                If chain and rope:{' '}
                <Quantity value={nylonAlternative.diameterMm / 1000} kind="diameter" /> nylon
                three-strand, up to <Quantity value={nylonAlternative.lengthM} kind="length" />{' '}
                <span className="text-ink-700">
                  (instead of part of the chain; not in the checks)
                </span>
              </li>
            )}
            {connectors.map((c, i) => (
              <li key={`${c.label}-${i}`}>
                {CONNECTOR_KIND_LABELS[c.kind]}: {c.label}
                {c.nominalIn !== undefined && ` (${inchFractionLabel(c.nominalIn)})`}
              </li>
            ))}
          </ul>
        </section>
        <section aria-label="Key figures">
          <h3 className="mb-1 text-base">Key figures</h3>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            <dt className="font-bold">Design load</dt>
            <dd>
              <Quantity value={result.loadN} kind="force" />
            </dd>
            {result.scopeRatio !== null && (
              <>
                <dt className="font-bold">Scope</dt>
                <dd>
                  {result.scopeRatio.toFixed(1)} : 1
                  {result.scopeRung ? ` (${result.scopeRung.label})` : ''}
                </dd>
              </>
            )}
            {result.swingRadius && (
              <>
                <dt className="font-bold">Swing radius</dt>
                <dd>
                  <Quantity value={result.swingRadius.radiusM} kind="length" />
                </dd>
              </>
            )}
            {result.anchor && (
              <>
                <dt className="font-bold">Anchor vs model</dt>
                <dd>
                  {result.anchor.neededKg === null
                    ? 'not checked on this seabed'
                    : result.anchor.meetsSuggested
                      ? 'holds this plan’s wind and a squall'
                      : result.anchor.meetsMinimum
                        ? 'holds this plan’s wind only'
                        : 'too light for this wind'}
                  {result.anchor.massMargin !== null &&
                    ` (${times(result.anchor.massMargin)} the mass needed)`}
                </dd>
              </>
            )}
            {link && (
              <>
                <dt className="font-bold">Weakest link</dt>
                <dd>
                  {link.weakest.label}: {times(link.weakest.margin)} its working limit,{' '}
                  {times(link.weakest.factor)} breaking
                </dd>
              </>
            )}
          </dl>
        </section>
      </div>
      {result.warnings.length > 0 && (
        <section aria-label="Warnings">
          <h3 className="mb-1 text-base">Warnings</h3>
          <ul className="list-disc pl-5">
            {result.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </section>
      )}
      {plan.notes && <p className="whitespace-pre-wrap">{plan.notes}</p>}
      <footer className="border-t border-ink-900 pt-2 text-xs">
        Ratings are for new, undamaged gear; follow the maker&apos;s ratings and local regulations;
        in doubt ask a qualified rigger or surveyor. Loads are steady estimates: gusts and waves add
        shock loads. Sources: ABYC H-40 load table, UFC 4-159-03 (anchor holding and factors of
        safety), 49 CFR 393.108, RR-C-271, MIT 2.019 catenary.
      </footer>
    </article>
  );
}
