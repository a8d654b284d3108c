import {
  ABYC_BEAM_POWER_FT,
  ABYC_BEAM_SAIL_FT,
  ABYC_LOA_FT,
  ABYC_LOAD_15KN_LB,
  ABYC_LOAD_30KN_LB,
  ABYC_LOAD_42KN_LB,
  HULL_TYPES,
  MULTIHULL_LOAD_FACTOR,
  type HullType,
} from '../tables/abyc-h40';
import { firstAtLeast, interpolateLinear } from '../internal/interpolate';
import { optionalBoolean, requireNumber, requireObject, requireOneOf } from '../internal/validate';
import { M_PER_FT, N_PER_LBF } from '../units/units';
import { cautionList } from '../cautions';

/** How a length between two table rows is treated. */
export type RowMode = 'interpolate' | 'next-row-up';

/** Input of {@link designLoad}. */
export interface DesignLoadInput {
  /** Length overall, m. Table range 10–60 ft (3.048–18.288 m). */
  loaM: number;
  /** Beam, m (optional; ignored for multihulls). */
  beamM?: number;
  hull: HullType;
  /** Design wind speed, knots, 0–100. */
  windKn: number;
  /** Allow LOA or beam beyond the table; the result is then flagged `extrapolated`. */
  extrapolate?: boolean;
  /** `interpolate` (default) between rows, or `next-row-up` as the handbook example does. */
  rows?: RowMode;
}

/** Result of {@link designLoad}. */
export interface DesignLoadResult {
  /** Horizontal design load on the rode, N. */
  loadN: number;
  /** The (possibly fractional) LOA row of the table the load was read at, ft. */
  rowLoaFt: number;
  governedBy: 'loa' | 'beam';
  /** True beyond 42 kn or beyond the table's LOA/beam rows. */
  extrapolated: boolean;
  /** True for multihulls (no table column) and for any extrapolation. */
  approximate: boolean;
  basis: string;
  cautions: readonly string[];
}

const MAX_WIND_KN = 100;
const LOA_MIN_FT = ABYC_LOA_FT[0] ?? 10;
const LOA_MAX_FT = ABYC_LOA_FT[ABYC_LOA_FT.length - 1] ?? 60;

/** LOA-equivalent (ft) of a beam, read through the beam column; below the table, pro rata. */
function loaFromBeamFt(beamFt: number, column: readonly number[]): number {
  const first = column[0] ?? 1;
  if (beamFt < first) return (LOA_MIN_FT * beamFt) / first;
  return interpolateLinear(column, ABYC_LOA_FT, beamFt);
}

/** Table loads (lb) at an LOA-equivalent row; below 10 ft scaled with LOA² (derived). */
function loadsAtRow(rowFt: number): [number, number, number] {
  if (rowFt < LOA_MIN_FT) {
    const k = (rowFt / LOA_MIN_FT) ** 2;
    return [
      (ABYC_LOAD_15KN_LB[0] ?? 0) * k,
      (ABYC_LOAD_30KN_LB[0] ?? 0) * k,
      (ABYC_LOAD_42KN_LB[0] ?? 0) * k,
    ];
  }
  return [
    interpolateLinear(ABYC_LOA_FT, ABYC_LOAD_15KN_LB, rowFt),
    interpolateLinear(ABYC_LOA_FT, ABYC_LOAD_30KN_LB, rowFt),
    interpolateLinear(ABYC_LOA_FT, ABYC_LOAD_42KN_LB, rowFt),
  ];
}

/**
 * Load (lb) at wind `v` from the three column loads: linear in V² between the 15, 30 and
 * 42 kn columns, F15·(V/15)² below 15 kn and F42·(V/42)² beyond 42 kn (drag ∝ V², common
 * practice for the extrapolation).
 */
export function loadAtWindLb(v: number, f15: number, f30: number, f42: number): number {
  const v2 = v * v;
  if (v <= 15) return (f15 * v2) / 225;
  if (v <= 30) return f15 + ((f30 - f15) * (v2 - 225)) / 675;
  if (v <= 42) return f30 + ((f42 - f30) * (v2 - 900)) / 864;
  return (f42 * v2) / 1764;
}

function snapRow(rowFt: number, mode: RowMode): number {
  if (mode === 'interpolate' || rowFt < LOA_MIN_FT || rowFt > LOA_MAX_FT) return rowFt;
  return ABYC_LOA_FT[firstAtLeast(ABYC_LOA_FT, rowFt)] ?? rowFt;
}

/**
 * Horizontal design load on an anchored boat, N, from ABYC H-40 Table 1 (from memory):
 * enter by LOA or by beam, whichever gives the larger load (Boat Mechanical Systems Handbook, seen); interpolate between
 * rows (or take the next row up); scale with wind speed squared between and beyond the 15 /
 * 30 / 42 kn columns, flagged beyond 42 kn. Multihulls: sailboat row by LOA × 1.5 (common
 * practice, approximate). Throws {@link CalcInputError} naming the field.
 */
export function designLoad(input: DesignLoadInput): DesignLoadResult {
  const raw = requireObject(input, '');
  const hull = requireOneOf(raw.hull, 'hull', HULL_TYPES);
  const extrapolate = optionalBoolean(raw.extrapolate, 'extrapolate', false);
  const mode = requireOneOf(raw.rows ?? 'interpolate', 'rows', ['interpolate', 'next-row-up']);
  const windKn = requireNumber(raw.windKn, 'windKn', 0, MAX_WIND_KN);
  const tableHint = 'm (10–60 ft, the ABYC table) unless extrapolate is true';
  const loaM = requireNumber(
    raw.loaM,
    'loaM',
    extrapolate ? 0 : LOA_MIN_FT * M_PER_FT,
    extrapolate ? 120 * M_PER_FT : LOA_MAX_FT * M_PER_FT,
    extrapolate ? 'min' : 'none',
    extrapolate ? 'm (at most 120 ft)' : tableHint,
  );
  const loaFt = loaM / M_PER_FT;
  let rowFt = loaFt;
  let governedBy: 'loa' | 'beam' = 'loa';
  if (raw.beamM !== undefined && hull !== 'multihull') {
    const column = hull === 'sail' ? ABYC_BEAM_SAIL_FT : ABYC_BEAM_POWER_FT;
    const maxBeamFt = column[column.length - 1] ?? 0;
    const beamM = requireNumber(
      raw.beamM,
      'beamM',
      0,
      extrapolate ? 60 * M_PER_FT : maxBeamFt * M_PER_FT,
      'min',
      extrapolate
        ? 'm'
        : `m (${maxBeamFt} ft, the ABYC ${hull} beam column) unless extrapolate is true`,
    );
    const beamRowFt = loaFromBeamFt(beamM / M_PER_FT, column);
    if (beamRowFt > rowFt) {
      rowFt = beamRowFt;
      governedBy = 'beam';
    }
  }
  rowFt = snapRow(rowFt, mode);
  const [f15, f30, f42] = loadsAtRow(rowFt);
  let loadLb = loadAtWindLb(windKn, f15, f30, f42);
  if (hull === 'multihull') loadLb *= MULTIHULL_LOAD_FACTOR;
  const outsideRows = rowFt < LOA_MIN_FT || rowFt > LOA_MAX_FT;
  const extrapolated = windKn > 42 || outsideRows;
  return {
    loadN: loadLb * N_PER_LBF,
    rowLoaFt: rowFt,
    governedBy,
    extrapolated,
    approximate: hull === 'multihull' || extrapolated,
    basis: describe(hull, governedBy, mode, windKn, outsideRows),
    cautions: designLoadCautions(hull, extrapolated),
  };
}

function describe(
  hull: HullType,
  governedBy: 'loa' | 'beam',
  mode: RowMode,
  windKn: number,
  outsideRows: boolean,
): string {
  const entry =
    hull === 'multihull'
      ? 'entered by length in the sailboat rows and multiplied by 1.5 for a multihull (our rule, common practice, approximate)'
      : `entered by ${governedBy === 'beam' ? 'beam' : 'length'}, whichever gives the larger load (Boat Mechanical Systems Handbook, seen)`;
  const rows = outsideRows
    ? 'extended beyond the table rows'
    : mode === 'interpolate'
      ? 'interpolated between rows'
      : 'read at the next row up';
  const wind =
    windKn > 42
      ? 'scaled beyond the 42 kn column with wind speed squared (extrapolated)'
      : 'scaled with wind speed squared between the 15, 30 and 42 kn columns';
  return `Horizontal load from the ABYC H-40 table of design loads (values from memory), ${entry}, ${rows} and ${wind}.`;
}

const TABLE_NOTE =
  'The load table assumes a boat lying to one anchor with moderate sea; surge, yawing and swell raise loads sharply.';
const MULTIHULL_NOTE =
  'The table has no multihull column; this load uses our 1.5 × sailboat rule and is approximate.';
const EXTRAPOLATED_NOTE = 'This load lies beyond the table and is an extrapolation.';
const PLAIN_CAUTIONS = cautionList(TABLE_NOTE);
const MULTIHULL_CAUTIONS = cautionList(TABLE_NOTE, MULTIHULL_NOTE);
const EXTRAPOLATED_CAUTIONS = cautionList(TABLE_NOTE, EXTRAPOLATED_NOTE);
const MULTIHULL_EXTRAPOLATED_CAUTIONS = cautionList(TABLE_NOTE, MULTIHULL_NOTE, EXTRAPOLATED_NOTE);

function designLoadCautions(hull: HullType, extrapolated: boolean): readonly string[] {
  if (hull === 'multihull')
    return extrapolated ? MULTIHULL_EXTRAPOLATED_CAUTIONS : MULTIHULL_CAUTIONS;
  return extrapolated ? EXTRAPOLATED_CAUTIONS : PLAIN_CAUTIONS;
}
