import {
  MARGIN_BAND_LABELS,
  READINESS_STATUS_LABELS,
  STORM_LOCATION_LABELS,
  type ReadinessDto,
  type StormWatchDto,
} from '@app/shared';
import type { Harbor, StormWatch } from '../../models';
import { csvField } from '../../lib/csv';

export function toStormWatchDto(w: StormWatch): StormWatchDto {
  return {
    id: w.id,
    name: w.name,
    sustainedKn: w.sustainedKn,
    gustKn: w.gustKn,
    surgeM: w.surgeM,
    arrivesAt: w.arrivesAt.toISOString(),
    endsAt: w.endsAt.toISOString(),
    harborIds: w.harborIds,
    note: w.note,
    shareDetails: w.shareDetails,
    status: w.status,
    checklist: w.checklist,
    openedBy: w.openedBy?.displayName ?? '',
    closedAt: w.closedAt?.toISOString() ?? null,
    lessons: w.lessons,
    lessonsPostId: w.lessonsPostId,
    createdAt: w.createdAt.toISOString(),
  };
}

export const BOARD_COLUMNS = [
  'boat',
  'owner',
  'harbour',
  'status',
  'location',
  'plan',
  'weakest_link',
  'wll_margin_at_gust',
  'break_factor_at_gust',
  'margin',
  'wll_margin_at_sustained',
  'scope',
  'checklist_done',
  'help_wanted',
  'help_note',
  'buddy',
  'updated_at',
] as const;

const fixed = (v: number | null | undefined, digits = 2) =>
  v === null || v === undefined ? null : v.toFixed(digits);

/** The board as CSV (RFC 4180, formula-safe like the ledger export): one row per boat. */
export function boardCsv(watch: StormWatch, rows: ReadinessDto[], harbors: Harbor[]): string {
  const harbourName = new Map(harbors.map((h) => [h.id, h.name]));
  const lines = rows.map((r) => {
    const d = r.details;
    const c = d?.check ?? null;
    return [
      r.boatName,
      r.ownerName,
      r.harborId ? (harbourName.get(r.harborId) ?? '') : '',
      READINESS_STATUS_LABELS[r.status],
      d?.location ? STORM_LOCATION_LABELS[d.location] : null,
      c?.planName ?? null,
      c?.weakestLink?.label ?? null,
      fixed(c?.weakestLink?.wllMargin),
      fixed(c?.weakestLink?.breakFactor),
      c?.band ? MARGIN_BAND_LABELS[c.band] : null,
      fixed(c?.sustainedMargin),
      fixed(c?.scopeRatio, 1),
      d ? `${d.ticked.length}/${watch.checklist.length}` : null,
      d ? (d.helpWanted ? 'yes' : 'no') : null,
      d?.helpNote || null,
      d?.buddy?.name ?? null,
      d?.updatedAt ?? null,
    ]
      .map(csvField)
      .join(',');
  });
  return [BOARD_COLUMNS.join(','), ...lines].join('\r\n') + '\r\n';
}
