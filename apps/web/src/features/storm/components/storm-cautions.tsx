/** The usual cautions of storm preparation, shown on every storm-watch screen. */
export function StormCautions({ cautions }: { cautions: readonly string[] }) {
  return (
    <aside
      aria-labelledby="storm-cautions-heading"
      className="rounded-md border-l-4 border-signal-600 bg-signal-50 px-4 py-3 text-sm text-ink-900"
    >
      <h2 id="storm-cautions-heading" className="text-base font-bold">
        Before you rely on any of this
      </h2>
      <ul className="mt-1 list-disc pl-5">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
