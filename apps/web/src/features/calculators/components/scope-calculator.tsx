import {
  CHAIN_ROWS,
  SCOPE_LADDER,
  STANDARD_CAUTIONS,
  catenary,
  scope,
  scopeRung,
  type ChainGrade,
  UPLIFT_WARN_DEG,
} from '@app/calc';
import { useState } from 'react';
import { useConditions, useLinkedState } from '../utils/conditions';
import { LinkedNote } from './linked-note';
import { Quantity } from '@/components/units/quantity';
import { QuantityField } from '@/components/units/quantity-field';
import { sizeInGrade } from '../utils/options';
import { fieldError, runCalc } from '../utils/run-calc';
import { CalcCard } from './calc-card';
import { ChainFields } from './chain-fields';
import { CatenaryDrawing } from './catenary-drawing';
import { NoResult, ResultList, WarningList } from './result-list';

interface ScopeState {
  depthM: number | undefined;
  bowHeightM: number | undefined;
  tideM: number | undefined;
  chainLengthM: number | undefined;
  ropeLengthM: number | undefined;
  loadN: number | undefined;
}

const START: ScopeState = {
  depthM: 6,
  bowHeightM: 1.2,
  tideM: 1.5,
  chainLengthM: 40,
  ropeLengthM: 0,
  loadN: 3200,
};

const kgPerMOf = (tradeSizeIn: number) =>
  CHAIN_ROWS.find((r) => Math.abs(r.tradeSizeIn - tradeSizeIn) < 1e-9)?.kgPerM ?? Number.NaN;

/** Scope ratio and the chain's catenary under a load, drawn to scale as you type. */
export function ScopeCalculator() {
  const shared = useConditions();
  const { conditions: c } = shared;
  const linked = useLinkedState<ScopeState, 'depthM' | 'bowHeightM' | 'tideM' | 'loadN'>(START, {
    depthM: c.depthM,
    bowHeightM: c.bowHeightM,
    tideM: c.tideM,
    loadN: shared.loadN,
  });
  const v = linked.value;
  const set = linked.set;
  const [grade, setGrade] = useState<ChainGrade>('G43');
  const [size, setSize] = useState(3 / 8);
  const tradeSizeIn = sizeInGrade(grade, size);
  const { depthM, bowHeightM, tideM = 0, chainLengthM, ropeLengthM = 0, loadN } = v;
  const ready =
    depthM !== undefined &&
    bowHeightM !== undefined &&
    chainLengthM !== undefined &&
    loadN !== undefined;
  const outcome = runCalc(() => {
    if (!ready) return null;
    const rodeM = chainLengthM + ropeLengthM;
    const ratio = rodeM / (depthM + bowHeightM + tideM);
    return {
      ratio,
      rung: scopeRung(ratio),
      ladder: SCOPE_LADDER.map((r) => ({
        ...r,
        rodeM: scope({ depthM, bowHeightM, tideM, ratio: r.ratio }).rodeM,
      })),
      shape: catenary({
        depthM,
        bowHeightM,
        tideM,
        chainKgPerM: kgPerMOf(tradeSizeIn),
        horizontalLoadN: loadN,
        chainLengthM,
        ropeLengthM,
      }),
    };
  });
  const r = outcome.ok ? outcome.value : null;
  const err = (f: string) => fieldError(outcome, f);
  return (
    <CalcCard
      title="Scope and catenary"
      intro="How much rode to let out, and the shape the chain takes under a steady pull."
      basis={
        r ? `${r.shape.basis} Scope = rode ÷ (depth + bow-roller height + tidal rise).` : undefined
      }
      source="Catenary after MIT 2.019 Mooring Dynamics (seen); scope ladder after Gerr (seen); scope from keelboat sailing-course practice (seen)."
      assumptions={[
        'Steady load, chain of uniform weight, rope treated as weightless and straight.',
        'Height is measured from the seabed to the bow roller at high water.',
        'Chain mass from the chain table (±10 %), reduced for buoyancy in sea water.',
      ]}
      cautions={r?.shape.cautions ?? STANDARD_CAUTIONS}
    >
      <LinkedNote own={linked.own} onFollow={linked.follow} />
      <div className="grid gap-3 sm:grid-cols-3">
        <QuantityField
          label="Depth at the anchor"
          kind="length"
          value={v.depthM}
          onValueChange={(depthM) => set({ depthM })}
          error={err('depthM')}
        />
        <QuantityField
          label="Bow-roller height"
          kind="length"
          value={v.bowHeightM}
          onValueChange={(bowHeightM) => set({ bowHeightM })}
          error={err('bowHeightM')}
        />
        <QuantityField
          label="Tidal rise to come"
          kind="length"
          value={v.tideM}
          onValueChange={(tideM) => set({ tideM })}
          error={err('tideM')}
        />
        <ChainFields
          gradeLabel="Chain grade"
          sizeLabel="Chain size"
          grade={grade}
          tradeSizeIn={tradeSizeIn}
          onGradeChange={setGrade}
          onSizeChange={setSize}
          sizeError={err('chainKgPerM')}
        />
        <QuantityField
          label="Chain let out"
          kind="length"
          value={v.chainLengthM}
          onValueChange={(chainLengthM) => set({ chainLengthM })}
          error={err('chainLengthM')}
        />
        <QuantityField
          label="Rope let out (optional)"
          kind="length"
          value={v.ropeLengthM}
          onValueChange={(ropeLengthM) => set({ ropeLengthM })}
          error={err('ropeLengthM')}
        />
        <QuantityField
          label="Horizontal load"
          kind="force"
          value={v.loadN}
          onValueChange={(loadN) => set({ loadN })}
          hint="The design load, e.g. 3.2 kN or 720 lbf"
          error={err('horizontalLoadN')}
          className="sm:col-span-2"
        />
      </div>
      {r ? (
        <>
          <CatenaryDrawing
            result={r.shape}
            waterLevelM={(depthM ?? 0) + tideM}
            hasRope={ropeLengthM > 0}
          />
          <ResultList
            label="Scope and catenary results"
            items={[
              {
                label: 'Scope',
                value: `${r.ratio.toFixed(1)} : 1${r.rung ? ` (${r.rung.label})` : ' (below the 3:1 minimum)'}`,
              },
              {
                label: 'Chain on the seabed',
                value: <Quantity value={r.shape.onBottomM} kind="length" />,
              },
              { label: 'Anchor to bow', value: <Quantity value={r.shape.reachM} kind="length" /> },
              {
                label: 'Tension at the bow',
                value: <Quantity value={r.shape.bowTensionN} kind="force" />,
              },
              { label: 'Pull angle at the anchor', value: `${r.shape.anchorAngleDeg.toFixed(1)}°` },
            ]}
          />
          <p className="text-sm">
            Rode for{' '}
            {r.ladder.map((rung, i) => (
              <span key={rung.ratio}>
                {i > 0 && ', '}
                {rung.ratio}:1 <Quantity value={rung.rodeM} kind="length" />
              </span>
            ))}
            .
          </p>
          <WarningList
            warnings={
              r.shape.anchorAngleDeg > UPLIFT_WARN_DEG
                ? [
                    `Under this load the chain pulls the anchor ${r.shape.anchorAngleDeg.toFixed(0)}° upward (we warn above ${UPLIFT_WARN_DEG}°, from memory): let out more rode, add chain or hang a kellet.`,
                  ]
                : []
            }
          />
        </>
      ) : (
        <NoResult
          message={outcome.ok ? 'Enter depth, bow height, chain length and load.' : outcome.message}
        />
      )}
    </CalcCard>
  );
}
