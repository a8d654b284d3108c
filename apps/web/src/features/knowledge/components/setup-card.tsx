import {
  ANCHOR_TYPE_LABELS,
  CHAIN_GRADE_LABELS,
  CONNECTOR_KIND_LABELS,
  HULL_TYPE_LABELS,
  ROPE_CONSTRUCTION_LABELS,
  ROPE_MATERIAL_LABELS,
  formatForce,
  formatLength,
  formatMass,
  inchFractionLabel,
  type UnitSystem,
} from '@app/calc';
import type { SetupCardDto } from '@app/shared';
import { formatQuantity } from '@/lib/units/format-quantity';

const fix = (n: number, d = 1) => n.toFixed(d);

/**
 * A post's tackle setup with the figures computed on the server by @app/calc, and the cautions that go with
 * them. Figures are estimates: the maker's ratings, local rules and a qualified rigger come first.
 */
export function SetupCard({ card, units }: { card: SetupCardDto; units: UnitSystem }) {
  const { setup } = card;
  const c = setup.components;
  const len = (m: number) => formatLength(m, units);
  // Rope and chain sizes as the trade writes them: mm in metric, the inch fraction (5/16 in) in imperial.
  const dia = (mm: number) => formatQuantity(mm / 1000, 'diameter', units);
  return (
    <section
      aria-labelledby="setup-title"
      className="flex flex-col gap-3 rounded-md border-2 border-ink-800 bg-sand-50 p-4"
    >
      <h2 id="setup-title" className="text-xl">
        Tackle setup{setup.boat.label ? `: ${setup.boat.label}` : ''}
      </h2>
      <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
        <Row
          term="Boat"
          value={`${HULL_TYPE_LABELS[setup.boat.hull]}, ${len(setup.boat.loaM)} LOA`}
        />
        <Row term="Design wind" value={`${setup.windKn} kn`} />
        {c.anchor && (
          <Row
            term="Anchor"
            value={`${ANCHOR_TYPE_LABELS[c.anchor.type]}, ${formatMass(c.anchor.massKg, units)}`}
          />
        )}
        {c.chain && (
          <Row
            term="Chain"
            value={`${CHAIN_GRADE_LABELS[c.chain.grade]}, ${c.chain.tradeSizeIn ? inchFractionLabel(c.chain.tradeSizeIn) : `${c.chain.nominalMm ?? ''} mm`}, ${len(c.chain.lengthM)}`}
          />
        )}
        {c.rode && (
          <Row
            term="Rode"
            value={`${ROPE_MATERIAL_LABELS[c.rode.material]} ${ROPE_CONSTRUCTION_LABELS[c.rode.construction].toLowerCase()}, ${dia(c.rode.diameterMm)}, ${len(c.rode.lengthM)}`}
          />
        )}
        {c.snubber && (
          <Row
            term="Snubber"
            value={`${ROPE_MATERIAL_LABELS[c.snubber.material]}, ${dia(c.snubber.diameterMm)}, ${len(c.snubber.lengthM)}`}
          />
        )}
        {c.connectors.map((k) => (
          <Row
            key={k.label}
            term={k.label}
            value={
              k.wllN
                ? `WLL ${formatForce(k.wllN, units)}`
                : k.nominalIn
                  ? `${inchFractionLabel(k.nominalIn)} ${CONNECTOR_KIND_LABELS[k.kind].toLowerCase()}`
                  : `${CONNECTOR_KIND_LABELS[k.kind]}, no rating given`
            }
          />
        ))}
      </dl>
      <h3 className="text-base">Computed figures</h3>
      <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
        <Row term="Design load" value={formatForce(card.loadN, units)} />
        {card.weakest && (
          <Row
            term="Weakest link"
            value={`${card.weakest.label}: ${fix(card.weakest.marginOnWll, 2)}× its WLL, breaks at ${fix(card.weakest.breakFactor)}× the load`}
          />
        )}
        <Row
          term={`Scope at ${len(setup.depthM)} depth`}
          value={
            card.scopeRatio
              ? `${fix(card.scopeRatio)}:1${card.scopeLabel ? ` (${card.scopeLabel})` : ''}`
              : 'not enough rode'
          }
        />
        {card.catenary && (
          <Row
            term="Catenary under the load"
            value={`${len(card.catenary.onBottomM)} of chain on the seabed, pull at the anchor ${fix(card.catenary.anchorAngleDeg)}°`}
          />
        )}
        {card.anchor && card.anchor.neededKg !== null && (
          <Row
            term="Anchor against the holding model"
            value={`${
              card.anchor.meetsSuggested
                ? 'holds this wind and a squall'
                : card.anchor.meetsMinimum
                  ? 'holds this wind only'
                  : 'too light for this wind'
            } (needs ${formatMass(card.anchor.neededKg, units)})`}
          />
        )}
      </dl>
      {card.recommendation && (
        <>
          <h3 className="text-base">What Rodewise would carry at {setup.windKn} kn</h3>
          <dl className="grid grid-cols-1 gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
            {card.recommendation.anchorKg !== null && (
              <Row
                term="Anchor"
                value={`${card.recommendation.anchorType}, ${formatMass(card.recommendation.anchorKg, units)}`}
              />
            )}
            {card.recommendation.chain && <Row term="Chain" value={card.recommendation.chain} />}
            {card.recommendation.nylon && <Row term="Nylon" value={card.recommendation.nylon} />}
            <Row term="Snubber" value={card.recommendation.snubber} />
          </dl>
        </>
      )}
      {card.warnings.length > 0 && (
        <ul className="list-disc pl-5 text-sm font-bold text-flare-700">
          {card.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      )}
      <div className="rounded-md border-l-4 border-signal-600 bg-signal-50 p-3 text-sm">
        <p className="font-bold">Before you rely on these figures</p>
        <ul className="list-disc pl-5">
          {card.cautions.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
        <p className="mt-1 text-xs text-ink-700">{card.basis}</p>
      </div>
    </section>
  );
}

function Row({ term, value }: { term: string; value: string }) {
  return (
    <div className="flex flex-wrap gap-x-2">
      <dt className="font-bold text-ink-900">{term}</dt>
      <dd className="text-ink-800">{value}</dd>
    </div>
  );
}
