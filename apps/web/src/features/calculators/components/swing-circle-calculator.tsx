import { STANDARD_CAUTIONS, formatLength, swingRadius } from '@app/calc';
import { useConditions, useLinkedState } from '../utils/conditions';
import { LinkedNote } from './linked-note';
import { cn } from '@/lib/cn';
import { Quantity } from '@/components/units/quantity';
import { QuantityField } from '@/components/units/quantity-field';
import { useUnits } from '@/lib/units/use-units';
import { drawingScale } from '../utils/drawing-scale';
import { fieldError, runCalc } from '../utils/run-calc';
import { CalcCard } from './calc-card';
import { NoResult, ResultList } from './result-list';

interface SwingState {
  rodeM: number | undefined;
  depthM: number | undefined;
  bowHeightM: number | undefined;
  loaM: number | undefined;
  neighbourM: number | undefined;
  neighbourRadiusM: number | undefined;
}

const START: SwingState = {
  rodeM: 35,
  depthM: 5,
  bowHeightM: 1.2,
  loaM: 10,
  neighbourM: 70,
  neighbourRadiusM: 30,
};

/** A common-practice margin between two swing circles, m (from memory). */
const COMFORT_M = 10;

function SwingDrawing({
  radiusM,
  neighbourM,
  neighbourRadiusM,
}: {
  radiusM: number;
  neighbourM: number;
  neighbourRadiusM: number;
}) {
  const { system } = useUnits();
  const span = radiusM + neighbourM + neighbourRadiusM;
  const rise = 2 * Math.max(radiusM, neighbourRadiusM);
  const s = drawingScale(span, rise, 640, 16, 120);
  const cy = s.heightPx / 2;
  const ax = s.x(radiusM);
  const bx = s.x(radiusM + neighbourM);
  const clearance = neighbourM - radiusM - neighbourRadiusM;
  return (
    <svg
      role="img"
      aria-label={`Your swing circle of ${formatLength(radiusM, system)} and a neighbour's of ${formatLength(neighbourRadiusM, system)}, ${formatLength(neighbourM, system)} apart: clearance ${formatLength(clearance, system)}.`}
      viewBox={`0 0 ${s.widthPx} ${s.heightPx.toFixed(0)}`}
      className="h-auto w-full rounded-md border border-sand-300 bg-sand-50"
    >
      <circle
        cx={ax}
        cy={cy}
        r={radiusM * s.pxPerM}
        className="fill-ink-700/10 stroke-ink-900"
        strokeWidth="2"
      />
      <circle
        cx={bx}
        cy={cy}
        r={neighbourRadiusM * s.pxPerM}
        className={cn('stroke-ink-600', clearance < 0 ? 'fill-flare-700/20' : 'fill-sand-300/40')}
        strokeWidth="2"
        strokeDasharray="5 4"
      />
      <circle cx={ax} cy={cy} r="4" className="fill-ink-900" />
      <circle cx={bx} cy={cy} r="4" className="fill-ink-600" />
      <line x1={ax} x2={bx} y1={cy} y2={cy} className="stroke-ink-600" strokeDasharray="2 3" />
      <text x={ax + 6} y={cy - 6} fontSize="12" className="fill-ink-900">
        your anchor
      </text>
      <text x={bx + 6} y={cy - 6} fontSize="12" className="fill-ink-700">
        neighbour
      </text>
    </svg>
  );
}

/** The circle a boat swings through, and the clearance to a neighbour's circle. */
export function SwingCircleCalculator() {
  const { conditions: c } = useConditions();
  const linked = useLinkedState<SwingState, 'depthM' | 'bowHeightM' | 'loaM'>(START, {
    depthM: c.depthM,
    bowHeightM: c.bowHeightM,
    loaM: c.loaM,
  });
  const v = linked.value;
  const set = linked.set;
  const { rodeM, depthM, bowHeightM, loaM, neighbourM, neighbourRadiusM } = v;
  const outcome = runCalc(() =>
    rodeM === undefined || depthM === undefined || bowHeightM === undefined || loaM === undefined
      ? null
      : swingRadius({ rodeM, depthM, bowHeightM, loaM }),
  );
  const r = outcome.ok ? outcome.value : null;
  const err = (f: string) => fieldError(outcome, f);
  const hasNeighbour =
    neighbourM !== undefined &&
    neighbourRadiusM !== undefined &&
    neighbourM > 0 &&
    neighbourRadiusM >= 0;
  const clearance = r && hasNeighbour ? neighbourM - r.radiusM - neighbourRadiusM : undefined;
  return (
    <CalcCard
      title="Swing circle and clearance"
      intro="The circle your boat can sweep at low water, and the room left to a neighbour swinging on theirs."
      basis={r?.basis}
      source="Swing radius = LOA + √(rode² − height²), nautical-training practice (seen); clearance is the distance between anchors less both radii."
      assumptions={[
        'Worst case at low water with the rode stretched straight.',
        "The neighbour's radius is your estimate of their rode and length.",
        `A clearance under ${COMFORT_M} m is flagged (common practice, from memory).`,
      ]}
      cautions={[
        ...STANDARD_CAUTIONS,
        'Boats on chain, on rope and multihulls swing at different rates and may meet even with clear circles.',
      ]}
    >
      <LinkedNote own={linked.own} onFollow={linked.follow} />
      <div className="grid gap-3 sm:grid-cols-3">
        <QuantityField
          label="Rode let out"
          kind="length"
          value={rodeM}
          onValueChange={(x) => set({ rodeM: x })}
          error={err('rodeM')}
        />
        <QuantityField
          label="Depth at low water"
          kind="length"
          value={depthM}
          onValueChange={(x) => set({ depthM: x })}
          error={err('depthM')}
        />
        <QuantityField
          label="Bow-roller height"
          kind="length"
          value={bowHeightM}
          onValueChange={(x) => set({ bowHeightM: x })}
          error={err('bowHeightM')}
        />
        <QuantityField
          label="Your LOA"
          kind="length"
          value={loaM}
          onValueChange={(x) => set({ loaM: x })}
          error={err('loaM')}
        />
        <QuantityField
          label="Distance to the neighbour's anchor"
          kind="length"
          value={neighbourM}
          onValueChange={(x) => set({ neighbourM: x })}
        />
        <QuantityField
          label="Neighbour's swing radius"
          kind="length"
          value={neighbourRadiusM}
          onValueChange={(x) => set({ neighbourRadiusM: x })}
        />
      </div>
      {r ? (
        <>
          {hasNeighbour && (
            <SwingDrawing
              radiusM={r.radiusM}
              neighbourM={neighbourM}
              neighbourRadiusM={neighbourRadiusM}
            />
          )}
          <ResultList
            label="Swing results"
            items={[
              { label: 'Your swing radius', value: <Quantity value={r.radiusM} kind="length" /> },
              ...(clearance === undefined
                ? []
                : [
                    {
                      label: 'Clearance between circles',
                      value: (
                        <span className={clearance < COMFORT_M ? 'text-flare-700' : undefined}>
                          <Quantity value={clearance} kind="length" />
                          {clearance < 0
                            ? ' — the circles overlap'
                            : clearance < COMFORT_M
                              ? ' — tight'
                              : ''}
                        </span>
                      ),
                    },
                  ]),
            ]}
          />
        </>
      ) : (
        <NoResult
          message={outcome.ok ? 'Enter rode, depth, bow height and LOA.' : outcome.message}
        />
      )}
    </CalcCard>
  );
}
