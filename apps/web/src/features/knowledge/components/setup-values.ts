import type { ANCHOR_KINDS, CHAIN_GRADE_IDS, PostSetupInput } from '@app/shared';

/** The flat form values of a setup block (strings as typed; SI units). */
export interface SetupValues {
  label: string;
  hull: string;
  loaM: string;
  beamM: string;
  bowHeightM: string;
  windKn: string;
  depthM: string;
  tideM: string;
  anchorType: string;
  anchorKg: string;
  chainGrade: string;
  chainIn: string;
  chainM: string;
  snubberMm: string;
  snubberM: string;
  shackleIn: string;
}

export const EMPTY_SETUP: SetupValues = {
  label: '',
  hull: 'sail',
  loaM: '',
  beamM: '',
  bowHeightM: '1',
  windKn: '30',
  depthM: '5',
  tideM: '0',
  anchorType: 'plow',
  anchorKg: '',
  chainGrade: 'G43',
  chainIn: '',
  chainM: '',
  snubberMm: '',
  snubberM: '',
  shackleIn: '',
};

const n = (s: string) => (s.trim() === '' ? undefined : Number(s));

/** Builds the setup the API expects from the form values (the server checks every figure). */
export function toSetupInput(v: SetupValues): PostSetupInput {
  const anchorKg = n(v.anchorKg);
  const chainIn = n(v.chainIn);
  const snubberMm = n(v.snubberMm);
  const shackleIn = n(v.shackleIn);
  return {
    boat: {
      label: v.label,
      hull: v.hull as PostSetupInput['boat']['hull'],
      loaM: n(v.loaM) ?? 0,
      beamM: n(v.beamM),
      bowHeightM: n(v.bowHeightM) ?? 1,
    },
    windKn: n(v.windKn) ?? 0,
    depthM: n(v.depthM) ?? 0,
    tideM: n(v.tideM) ?? 0,
    components: {
      ...(anchorKg
        ? { anchor: { type: v.anchorType as (typeof ANCHOR_KINDS)[number], massKg: anchorKg } }
        : {}),
      ...(chainIn
        ? {
            chain: {
              grade: v.chainGrade as (typeof CHAIN_GRADE_IDS)[number],
              tradeSizeIn: chainIn,
              lengthM: n(v.chainM) ?? 0,
            },
          }
        : {}),
      ...(snubberMm
        ? {
            snubber: {
              material: 'nylon' as const,
              diameterMm: snubberMm,
              lengthM: n(v.snubberM) ?? 0,
            },
          }
        : {}),
      connectors: shackleIn
        ? [{ label: 'anchor shackle', kind: 'shackle' as const, nominalIn: shackleIn }]
        : [],
    },
  };
}

/** Back from a stored setup to form values. */
export function fromSetup(s: PostSetupInput | null | undefined): SetupValues {
  if (!s) return EMPTY_SETUP;
  const c = s.components;
  const str = (x: number | undefined) => (x === undefined ? '' : String(x));
  return {
    label: s.boat.label ?? '',
    hull: s.boat.hull,
    loaM: str(s.boat.loaM),
    beamM: str(s.boat.beamM),
    bowHeightM: str(s.boat.bowHeightM),
    windKn: str(s.windKn),
    depthM: str(s.depthM),
    tideM: str(s.tideM),
    anchorType: c.anchor?.type ?? 'plow',
    anchorKg: str(c.anchor?.massKg),
    chainGrade: c.chain?.grade ?? 'G43',
    chainIn: str(c.chain?.tradeSizeIn),
    chainM: str(c.chain?.lengthM),
    snubberMm: str(c.snubber?.diameterMm),
    snubberM: str(c.snubber?.lengthM),
    shackleIn: str(c.connectors?.find((k) => k.kind === 'shackle')?.nominalIn),
  };
}
