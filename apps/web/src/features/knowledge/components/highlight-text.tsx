import type { HighlightPiece } from '@app/shared';

/** Text with the words that matched a search wrapped in <mark>. */
export function HighlightText({ pieces }: { pieces: HighlightPiece[] }) {
  return (
    <>
      {pieces.map((p, i) =>
        p.match ? (
          <mark key={i} className="rounded-sm bg-signal-100 px-0.5 font-bold text-ink-950">
            {p.text}
          </mark>
        ) : (
          <span key={i}>{p.text}</span>
        ),
      )}
    </>
  );
}
