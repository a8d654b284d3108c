import type { ReasoningStep, TackleRecommendation } from '@app/calc';

const TOPIC_LABELS: Record<ReasoningStep['topic'], string> = {
  load: 'Load',
  anchor: 'Anchor',
  chain: 'Chain',
  nylon: 'Nylon',
  snubber: 'Snubber',
  shackle: 'Shackle',
  scope: 'Scope',
  uplift: 'Chain at the anchor',
};

/** How the recommendation was reached, step by step in plain words, with its sources. */
export function RecommendationReasoning({
  rec,
  open = false,
}: {
  rec: TackleRecommendation;
  open?: boolean;
}) {
  return (
    <details className="text-xs text-ink-700" open={open}>
      <summary className="cursor-pointer font-bold">How we worked it out</summary>
      <dl className="mt-1 flex flex-col gap-1">
        {rec.reasoning.map((step, i) => (
          <div key={`${step.topic}-${i}`}>
            <dt className="inline font-bold">{TOPIC_LABELS[step.topic]}: </dt>
            <dd className="inline">{step.text}</dd>
          </div>
        ))}
      </dl>
    </details>
  );
}
