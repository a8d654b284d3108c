import { CalcInputError } from '../errors';
import {
  optionalBoolean,
  optionalNumber,
  requireLabel,
  requireNumber,
  requireObject,
  requireOneOf,
} from '../internal/validate';
import { HULL_TYPES, type HullType } from '../tables/abyc-h40';
import {
  ANCHOR_TYPES,
  BOTTOM_TYPES,
  type AnchorType,
  type BottomType,
} from '../tables/anchor-holding';
import { CHAIN_GRADES, type ChainGrade } from '../tables/chain-cfr';
import {
  ROPE_CONSTRUCTIONS,
  ROPE_MATERIALS,
  type RopeConstruction,
  type RopeMaterial,
} from '../tables/rope-nylon';
import { WATER_TYPES, type WaterType } from '../geometry/catenary';

/** Kinds of connector between rode parts. */
export type ConnectorKind = 'shackle' | 'swivel' | 'link' | 'splice' | 'other';
/** Every connector kind, for pickers. */
export const CONNECTOR_KINDS: readonly ConnectorKind[] = [
  'shackle',
  'swivel',
  'link',
  'splice',
  'other',
];
/** Human labels for the connector kinds. */
export const CONNECTOR_KIND_LABELS: Readonly<Record<ConnectorKind, string>> = {
  shackle: 'shackle',
  swivel: 'swivel',
  link: 'connecting link',
  splice: 'splice (rope to chain)',
  other: 'other fitting',
};

/** The boat a plan is for. */
export interface PlanBoat {
  loaM: number;
  beamM?: number;
  hull: HullType;
  displacementKg?: number;
  /** Bow-roller height above the water, m. */
  bowHeightM: number;
}

/** A connector in the rode; shackles can be rated from the table by `nominalIn`. */
export interface PlanConnector {
  label: string;
  kind: ConnectorKind;
  nominalIn?: number;
  wllN?: number;
  minBreakN?: number;
}

/** The ground tackle of a plan; every part is optional. */
export interface PlanComponents {
  anchor?: { type: AnchorType; massKg: number };
  /** Give `tradeSizeIn` (table sizes) or `nominalMm` (metric), not both. */
  chain?: { grade: ChainGrade; tradeSizeIn?: number; nominalMm?: number; lengthM: number };
  rode?: {
    material: RopeMaterial;
    construction: RopeConstruction;
    diameterMm: number;
    lengthM: number;
  };
  snubber?: {
    material: RopeMaterial;
    construction?: RopeConstruction;
    diameterMm: number;
    lengthM: number;
    /** 2 when the recommendation rigs two snubbers or a bridle (shown on the plan; each line is sized alone). */
    count?: 1 | 2;
  };
  /**
   * The nylon the recommendation offers for a chain-and-rope rode instead of all chain. Kept with the plan so
   * the member sees it, never counted in the load path or the rode length (the rode is `chain` + `rode`).
   */
  nylonAlternative?: {
    material: 'nylon';
    construction: 'three-strand';
    diameterMm: number;
    lengthM: number;
  };
  connectors?: PlanConnector[];
}

/** Input of `tacklePlan`. */
export interface TacklePlanInput {
  boat: PlanBoat;
  /** Design wind, kn (more than 0, at most 100). */
  windKn: number;
  /** Depth where the boat anchors, m (0–300). */
  depthM: number;
  /** Tidal rise still to come, m (default 0). */
  tideM?: number;
  bottom?: BottomType;
  water?: WaterType;
  /** Breaking strength ÷ load below which a part is flagged (optional: each part's working limit already carries its factor). */
  designFactor?: number;
  /** Rate rope and snubber wet (default true). */
  wet?: boolean;
  /** Allow sizes and boats beyond the tables (results are flagged). */
  extrapolate?: boolean;
  components: PlanComponents;
}

/** The checked and normalised plan input. */
export interface CheckedPlan {
  boat: PlanBoat;
  windKn: number;
  depthM: number;
  tideM: number;
  bottom: BottomType | undefined;
  water: WaterType;
  /** Breaking factor below which a part is flagged, when the member sets one. */
  designFactor: number | undefined;
  wet: boolean;
  extrapolate: boolean;
  components: PlanComponents & { connectors: PlanConnector[] };
}

function optionalPositive(value: unknown, field: string, max: number): number | undefined {
  return value === undefined ? undefined : requireNumber(value, field, 0, max, 'min');
}

function checkBoat(value: unknown): PlanBoat {
  const raw = requireObject(value, 'boat');
  const boat: PlanBoat = {
    loaM: requireNumber(raw.loaM, 'boat.loaM', 0, 120, 'min'),
    hull: requireOneOf(raw.hull, 'boat.hull', HULL_TYPES),
    bowHeightM: requireNumber(raw.bowHeightM, 'boat.bowHeightM', 0, 10),
  };
  const beamM = optionalPositive(raw.beamM, 'boat.beamM', 40);
  if (beamM !== undefined) boat.beamM = beamM;
  const displacementKg = optionalPositive(raw.displacementKg, 'boat.displacementKg', 500000);
  if (displacementKg !== undefined) boat.displacementKg = displacementKg;
  return boat;
}

function checkChain(value: unknown): NonNullable<PlanComponents['chain']> {
  const f = 'components.chain';
  const raw = requireObject(value, f);
  const chain: NonNullable<PlanComponents['chain']> = {
    grade: requireOneOf(raw.grade, `${f}.grade`, CHAIN_GRADES),
    lengthM: requireNumber(raw.lengthM, `${f}.lengthM`, 0, 1000, 'min'),
  };
  const hasIn = raw.tradeSizeIn !== undefined;
  const hasMm = raw.nominalMm !== undefined;
  if (hasIn === hasMm) {
    throw new CalcInputError(
      `${f}.tradeSizeIn`,
      `${f}.tradeSizeIn: give tradeSizeIn or nominalMm, exactly one`,
    );
  }
  if (hasIn)
    chain.tradeSizeIn = requireNumber(raw.tradeSizeIn, `${f}.tradeSizeIn`, 0, Infinity, 'min');
  else chain.nominalMm = requireNumber(raw.nominalMm, `${f}.nominalMm`, 0, Infinity, 'min');
  return chain;
}

function checkRope(value: unknown, f: string, maxLengthM: number) {
  const raw = requireObject(value, f);
  return {
    material: requireOneOf(raw.material, `${f}.material`, ROPE_MATERIALS),
    construction: requireOneOf(
      raw.construction ?? 'three-strand',
      `${f}.construction`,
      ROPE_CONSTRUCTIONS,
    ),
    diameterMm: requireNumber(raw.diameterMm, `${f}.diameterMm`, 0, Infinity, 'min'),
    lengthM: requireNumber(raw.lengthM, `${f}.lengthM`, 0, maxLengthM, 'min'),
  };
}

function checkConnectors(value: unknown): PlanConnector[] {
  if (value === undefined) return [];
  if (!Array.isArray(value) || value.length > 20) {
    throw new CalcInputError(
      'components.connectors',
      'components.connectors must be a list of at most 20',
    );
  }
  return (value as unknown[]).map((item, i) => {
    const f = `components.connectors[${i}]`;
    const raw = requireObject(item, f);
    const connector: PlanConnector = {
      label: requireLabel(raw.label, `${f}.label`),
      kind: requireOneOf(raw.kind, `${f}.kind`, CONNECTOR_KINDS),
    };
    const nominalIn = optionalPositive(raw.nominalIn, `${f}.nominalIn`, 2);
    const wllN = optionalPositive(raw.wllN, `${f}.wllN`, 1e7);
    const minBreakN = optionalPositive(raw.minBreakN, `${f}.minBreakN`, 1e8);
    if (nominalIn !== undefined) connector.nominalIn = nominalIn;
    if (wllN !== undefined) connector.wllN = wllN;
    if (minBreakN !== undefined) connector.minBreakN = minBreakN;
    if (wllN !== undefined && minBreakN !== undefined && minBreakN < wllN) {
      throw new CalcInputError(`${f}.minBreakN`, `${f}.minBreakN must be at least its wllN`);
    }
    return connector;
  });
}

/** Checks a plan input, throwing {@link CalcInputError} with the full field path. */
export function checkPlanInput(input: unknown): CheckedPlan {
  const raw = requireObject(input, '');
  const boat = checkBoat(raw.boat);
  const comps = requireObject(raw.components ?? {}, 'components');
  const components: CheckedPlan['components'] = { connectors: checkConnectors(comps.connectors) };
  if (comps.anchor !== undefined) {
    const a = requireObject(comps.anchor, 'components.anchor');
    components.anchor = {
      type: requireOneOf(a.type, 'components.anchor.type', ANCHOR_TYPES),
      massKg: requireNumber(a.massKg, 'components.anchor.massKg', 0, 1000, 'min'),
    };
  }
  if (comps.chain !== undefined) components.chain = checkChain(comps.chain);
  if (comps.rode !== undefined) components.rode = checkRope(comps.rode, 'components.rode', 1000);
  if (comps.snubber !== undefined)
    components.snubber = checkRope(comps.snubber, 'components.snubber', 100);
  return {
    boat,
    windKn: requireNumber(raw.windKn, 'windKn', 0, 100, 'min'),
    depthM: requireNumber(raw.depthM, 'depthM', 0, 300),
    tideM: optionalNumber(raw.tideM, 'tideM', 0, 0, 20),
    bottom: raw.bottom === undefined ? undefined : requireOneOf(raw.bottom, 'bottom', BOTTOM_TYPES),
    water: requireOneOf(raw.water ?? 'sea', 'water', WATER_TYPES),
    designFactor:
      raw.designFactor === undefined
        ? undefined
        : optionalNumber(raw.designFactor, 'designFactor', 0, 1, 20),
    wet: optionalBoolean(raw.wet, 'wet', true),
    extrapolate: optionalBoolean(raw.extrapolate, 'extrapolate', false),
    components,
  };
}
