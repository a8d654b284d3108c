import { formatLength, type CatenaryResult } from '@app/calc';
import { useUnits } from '@/lib/units/use-units';
import { drawingScale, pathThrough } from '../utils/drawing-scale';

export interface CatenaryDrawingProps {
  result: CatenaryResult;
  /** Seabed to the water surface (depth + tide), m. */
  waterLevelM: number;
  /** True when the last profile segment is rope (a chain leader with a rope rode). */
  hasRope: boolean;
}

/**
 * The rode to scale: seabed, water surface, chain lying on the bottom and hanging in its catenary,
 * the rope (straight) and the bow roller, with the same scale across and up.
 */
export function CatenaryDrawing({ result, waterLevelM, hasRope }: CatenaryDrawingProps) {
  const { system } = useUnits();
  const { profile, reachM, heightM } = result;
  const s = drawingScale(reachM * 1.08, heightM);
  const px = profile.map(([x, z]) => [s.x(x), s.y(z)] as const);
  const chainPts = hasRope ? px.slice(0, -1) : px;
  const ropePts = hasRope ? px.slice(-2) : [];
  const bow = px[px.length - 1] ?? [s.x(reachM), s.y(heightM)];
  const surface = s.y(waterLevelM);
  const length = (m: number) => formatLength(m, system);
  const label =
    `Rode drawn to scale: ${length(reachM)} from anchor to bow, ${length(heightM)} from seabed to bow roller, ` +
    `${length(result.onBottomM)} of chain on the seabed` +
    (result.liftsAtAnchor
      ? `; the chain leaves the seabed at the anchor, pulling ${result.anchorAngleDeg.toFixed(1)}° upward.`
      : '.');
  return (
    <figure className="flex flex-col gap-1">
      <svg
        role="img"
        aria-label={label}
        viewBox={`0 0 ${s.widthPx} ${s.heightPx.toFixed(0)}`}
        className="h-auto w-full rounded-md border border-sand-300 bg-sand-50"
        data-testid="catenary-drawing"
      >
        <rect
          x="0"
          y={surface}
          width={s.widthPx}
          height={s.y(0) - surface}
          className="fill-ink-700/15"
        />
        <line
          x1="0"
          x2={s.widthPx}
          y1={surface}
          y2={surface}
          className="stroke-ink-700"
          strokeDasharray="6 4"
        />
        <rect
          x="0"
          y={s.y(0)}
          width={s.widthPx}
          height={s.heightPx - s.y(0)}
          className="fill-sand-300"
        />
        <line
          x1="0"
          x2={s.widthPx}
          y1={s.y(0)}
          y2={s.y(0)}
          className="stroke-sand-500"
          strokeWidth="2"
        />
        <path
          d={pathThrough(chainPts)}
          fill="none"
          className="stroke-ink-900"
          strokeWidth="3"
          strokeLinejoin="round"
          data-part="chain"
        />
        {ropePts.length === 2 && (
          <path
            d={pathThrough(ropePts)}
            fill="none"
            className="stroke-signal-600"
            strokeWidth="2"
            strokeDasharray="2 3"
            data-part="rope"
          />
        )}
        <path
          d={`M${s.x(0) - 8} ${s.y(0)} l8 -10 l8 10 z`}
          className="fill-ink-600"
          aria-hidden="true"
        />
        <path
          d={`M${bow[0] - 4} ${bow[1]} l40 0 l-6 10 l-30 0 z`}
          className="fill-ink-900"
          aria-hidden="true"
        />
        <text x={s.x(0) + 10} y={s.y(0) - 6} fontSize="12" className="fill-ink-900">
          anchor
        </text>
        <text
          x={Math.max(4, bow[0] - 80)}
          y={Math.max(12, bow[1] - 8)}
          fontSize="12"
          className="fill-ink-900"
        >
          bow roller
        </text>
        <text x="6" y={Math.max(12, surface - 4)} fontSize="11" className="fill-ink-700">
          surface
        </text>
      </svg>
      <figcaption className="text-xs text-ink-600">
        Drawn to one scale across and up.{' '}
        {hasRope ? 'Solid: chain; dashed: rope.' : 'All-chain rode.'}
      </figcaption>
    </figure>
  );
}
