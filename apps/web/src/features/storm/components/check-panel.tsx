import { chainGradeWords, inchFractionLabel, type ChainGrade } from '@app/calc';
import type { StormCheckDto } from '@app/shared';
import { Quantity } from '@/components/units/quantity';
import { MarginBadge } from './margin-badge';

/** A plan checked against the forecast: the weakest link and its margins, scope, and the warnings. */
export function CheckPanel({ check }: { check: StormCheckDto }) {
  const weakest = check.weakestLink;
  return (
    <section
      aria-labelledby="check-heading"
      className="flex flex-col gap-3 rounded-lg border border-sand-300 bg-sand-50 p-4"
    >
      <h2 id="check-heading" className="text-xl">
        {check.planName} at the forecast gust of {check.windKn} kn
      </h2>
      <div className="flex flex-wrap items-center gap-2">
        <MarginBadge band={check.band} margin={weakest?.wllMargin ?? null} />
      </div>
      {weakest ? (
        <p>
          Weakest link: <strong>{weakest.label}</strong>. At the gust load of{' '}
          <Quantity value={check.loadN} kind="force" /> its working load limit is{' '}
          <strong>{weakest.wllMargin.toFixed(2)} ×</strong> the load
          {weakest.wllMargin < 1 ? ' — below its WLL' : ''}, and its breaking strength{' '}
          {weakest.breakFactor.toFixed(1)} × the load.
          {check.sustainedMargin !== null &&
            ` At the sustained ${check.sustainedKn} kn the margin is ${check.sustainedMargin.toFixed(2)} × WLL.`}
        </p>
      ) : (
        <p>The plan has no rated parts to check: add the chain and shackles to the plan.</p>
      )}
      {check.parts.length > 0 && (
        <table className="w-full max-w-xl text-left text-sm">
          <caption className="text-left text-sm font-bold">
            Every rated part at {check.windKn} kn, weakest first
          </caption>
          <thead>
            <tr>
              <th scope="col">Part</th>
              <th scope="col">WLL ÷ load</th>
              <th scope="col">Breaking ÷ load</th>
            </tr>
          </thead>
          <tbody>
            {check.parts.map((p) => (
              <tr key={p.label} className="border-t border-sand-300">
                <td>{p.label}</td>
                <td>
                  {p.wllMargin.toFixed(2)}
                  {p.wllMargin < 1 ? ' (below WLL)' : ''}
                </td>
                <td>{p.breakFactor.toFixed(1)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p>
        Scope {check.scopeRatio === null ? '—' : `${check.scopeRatio.toFixed(1)}:1`} in{' '}
        <Quantity value={check.depthM} kind="length" /> of water with{' '}
        <Quantity value={check.tideM} kind="length" /> of tide and surge on top.
      </p>
      {check.recommended && (
        <p>
          For comparison, the calc package recommends for this boat at {check.windKn} kn:{' '}
          {[
            check.recommended.chain &&
              `${inchFractionLabel(check.recommended.chain.tradeSizeIn)} ${chainGradeWords(check.recommended.chain.grade as ChainGrade)} chain`,
            check.recommended.shackleIn !== null &&
              `a ${inchFractionLabel(check.recommended.shackleIn)} shackle`,
            check.recommended.anchorKg !== null && `an anchor of ${check.recommended.anchorKg} kg`,
            `scope ${check.recommended.scopeRatio.toFixed(0)}:1`,
          ]
            .filter(Boolean)
            .join(', ')}
          .
        </p>
      )}
      {check.warnings.length > 0 && (
        <div>
          <h3 className="text-base font-bold">Warnings</h3>
          <ul className="list-disc pl-5 text-sm">
            {check.warnings.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </div>
      )}
      <p className="text-xs text-ink-600">{check.basis}</p>
    </section>
  );
}
