import { useId, type ReactNode } from 'react';

export interface CalcCardProps {
  title: string;
  intro?: ReactNode;
  /** The inputs and results. */
  children: ReactNode;
  /** How the figure is worked out (usually the calc result's `basis`). */
  basis?: string;
  /** Where the numbers come from. */
  source: string;
  assumptions: readonly string[];
  cautions: readonly string[];
}

/** The usual safety line every calculator shows in full view. */
export const SHORT_CAUTION =
  "Ratings are for new, undamaged gear; follow the maker's ratings and local regulations; in doubt ask a qualified rigger or surveyor.";

/** One calculator: inputs and results, then its formula basis, source, assumptions and cautions. */
export function CalcCard({
  title,
  intro,
  children,
  basis,
  source,
  assumptions,
  cautions,
}: CalcCardProps) {
  const headingId = useId();
  return (
    <section
      aria-labelledby={headingId}
      className="flex min-w-0 flex-col gap-4 rounded-lg border border-sand-300 bg-sand-50 p-4 shadow-card sm:p-5"
    >
      <header className="flex flex-col gap-1">
        <h2 id={headingId} className="text-xl">
          {title}
        </h2>
        {intro && <div className="text-sm text-ink-700">{intro}</div>}
      </header>
      {children}
      <p className="border-l-4 border-signal-600 bg-signal-50 px-3 py-2 text-xs text-ink-900">
        {SHORT_CAUTION}
      </p>
      <details className="rounded-md border border-sand-300 bg-sand-100 px-3 py-2 text-sm">
        <summary className="cursor-pointer font-bold">How this is worked out</summary>
        <dl className="mt-2 flex flex-col gap-2">
          {basis && (
            <div>
              <dt className="font-bold">Formula basis</dt>
              <dd>{basis}</dd>
            </div>
          )}
          <div>
            <dt className="font-bold">Source</dt>
            <dd>{source}</dd>
          </div>
          <div>
            <dt className="font-bold">Assumptions</dt>
            <dd>
              <ul className="list-disc pl-5">
                {assumptions.map((a) => (
                  <li key={a}>{a}</li>
                ))}
              </ul>
            </dd>
          </div>
          <div>
            <dt className="font-bold">Cautions</dt>
            <dd>
              <ul className="list-disc pl-5">
                {cautions.map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            </dd>
          </div>
        </dl>
      </details>
    </section>
  );
}
