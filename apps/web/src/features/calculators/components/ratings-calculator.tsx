import {
  STANDARD_CAUTIONS,
  chainSpec,
  ropeSpec,
  shackleSpec,
  type ChainGrade,
  type RopeConstruction,
  type RopeMaterial,
} from '@app/calc';
import { useState } from 'react';
import { Quantity } from '@/components/units/quantity';
import { QuantityField } from '@/components/units/quantity-field';
import { ChoiceField } from '@/components/ui/choice-field';
import { SelectField } from '@/components/ui/select-field';
import {
  CONSTRUCTION_OPTIONS,
  MATERIAL_OPTIONS,
  SHACKLE_OPTIONS,
  sizeInGrade,
} from '../utils/options';
import { fieldError, runCalc } from '../utils/run-calc';
import { CalcCard } from './calc-card';
import { ChainFields } from './chain-fields';
import { NoResult, ResultList } from './result-list';

function Ratings({ label, wllN, minBreakN }: { label: string; wllN: number; minBreakN: number }) {
  return (
    <ResultList
      label={label}
      items={[
        { label: 'Working load limit', value: <Quantity value={wllN} kind="force" /> },
        { label: 'Minimum breaking', value: <Quantity value={minBreakN} kind="force" /> },
      ]}
    />
  );
}

/** Chain, shackle and rope ratings from the published tables. */
export function RatingsCalculator() {
  const [grade, setGrade] = useState<ChainGrade>('G43');
  const [chainSize, setChainSize] = useState(3 / 8);
  const [shackle, setShackle] = useState(7 / 16);
  const [material, setMaterial] = useState<RopeMaterial>('nylon');
  const [construction, setConstruction] = useState<RopeConstruction>('three-strand');
  const [ropeM, setRopeM] = useState<number | undefined>(0.0127);
  const [wet, setWet] = useState(true);

  const size = sizeInGrade(grade, chainSize);
  const chain = runCalc(() => chainSpec({ grade, tradeSizeIn: size }));
  const shackleResult = runCalc(() => shackleSpec({ nominalIn: shackle }));
  const rope = runCalc(() =>
    ropeM === undefined
      ? null
      : ropeSpec({ material, construction, diameterMm: ropeM * 1000, wet }),
  );
  const ropeValue = rope.ok ? rope.value : null;

  return (
    <CalcCard
      title="Chain, shackle and rope ratings"
      intro="Working load limit and minimum breaking strength of each part of the rode."
      basis={[
        chain.ok ? chain.value.basis : '',
        shackleResult.ok ? shackleResult.value.basis : '',
        ropeValue?.basis ?? '',
      ]
        .filter(Boolean)
        .join(' ')}
      source="Chain: 49 CFR 393.108 working load limits (seen). Shackles: RR-C-271 (from memory, 1/2–3/4 in corroborated). Rope: engineering tables and the 49 CFR 393.108 tie-down limits (seen)."
      assumptions={[
        'Chain is marked with its grade; unmarked chain counts as grade 30 proof coil.',
        'Shackles are forged screw-pin anchor shackles.',
        'Rope working load limits are cargo tie-down figures; nylon rodes are often worked harder so they stretch.',
      ]}
      cautions={[
        ...new Set([
          ...(chain.ok ? chain.value.cautions : STANDARD_CAUTIONS),
          ...(ropeValue?.cautions ?? []),
        ]),
      ]}
    >
      <div className="grid gap-4 lg:grid-cols-3">
        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 font-bold">Chain</legend>
          <ChainFields
            gradeLabel="Chain grade"
            sizeLabel="Chain trade size"
            grade={grade}
            tradeSizeIn={size}
            onGradeChange={setGrade}
            onSizeChange={setChainSize}
            sizeError={fieldError(chain, 'tradeSizeIn')}
          />
          {chain.ok ? (
            <>
              <Ratings label="Chain ratings" {...chain.value} />
              <p className="text-xs text-ink-600">
                Mass about <Quantity value={chain.value.kgPerM} kind="mass" /> per metre.
              </p>
            </>
          ) : (
            <NoResult message={chain.message} />
          )}
        </fieldset>
        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 font-bold">Shackle</legend>
          <SelectField
            label="Shackle size"
            options={SHACKLE_OPTIONS}
            value={String(shackle)}
            onChange={(e) => setShackle(Number(e.target.value))}
            error={fieldError(shackleResult, 'nominalIn')}
          />
          {shackleResult.ok && <Ratings label="Shackle ratings" {...shackleResult.value} />}
        </fieldset>
        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1 font-bold">Rope</legend>
          <ChoiceField
            label="Fibre"
            options={MATERIAL_OPTIONS}
            value={material}
            onChoose={setMaterial}
          />
          <ChoiceField
            label="Construction"
            options={CONSTRUCTION_OPTIONS}
            value={construction}
            onChoose={setConstruction}
          />
          <QuantityField
            label="Rope diameter"
            kind="diameter"
            value={ropeM}
            onValueChange={setRopeM}
            error={fieldError(rope, 'diameterMm')}
          />
          <label className="flex min-h-11 items-center gap-3 text-sm">
            <input
              type="checkbox"
              checked={wet}
              onChange={(e) => setWet(e.target.checked)}
              className="size-5 accent-signal-600"
            />
            Rate it wet
          </label>
          {ropeValue ? (
            <Ratings label="Rope ratings" {...ropeValue} />
          ) : (
            <NoResult message={rope.ok ? 'Enter the rope diameter.' : rope.message} />
          )}
        </fieldset>
      </div>
    </CalcCard>
  );
}
