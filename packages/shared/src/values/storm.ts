// Storm-watch vocabulary, without the schemas: the web app's first load reads these.
/** Where a boat rides out a storm. */
export const STORM_LOCATIONS = [
  'own-anchor',
  'club-mooring',
  'marina-berth',
  'hauled-out',
  'leaving',
] as const;
export type StormLocation = (typeof STORM_LOCATIONS)[number];
export const STORM_LOCATION_LABELS: Readonly<Record<StormLocation, string>> = {
  'own-anchor': 'On its own anchor',
  'club-mooring': 'On a club mooring',
  'marina-berth': 'In a marina berth',
  'hauled-out': 'Hauled out',
  leaving: 'Leaving the area',
};

/** A boat's readiness on the board. */
export const READINESS_STATUSES = [
  'not-started',
  'in-progress',
  'ready',
  'help-wanted',
  'away',
] as const;
export type ReadinessStatus = (typeof READINESS_STATUSES)[number];
export const READINESS_STATUS_LABELS: Readonly<Record<ReadinessStatus, string>> = {
  'not-started': 'Not started',
  'in-progress': 'In progress',
  ready: 'Ready',
  'help-wanted': 'Help wanted',
  away: 'Away',
};

/**
 * How a plan fares at the forecast gust: `passes` = every part within its working load limit with room
 * (WLL ≥ 1.5 × load), `tight` = within WLL but with little room, `below-wll` = some part is loaded past its WLL.
 */
export const MARGIN_BANDS = ['passes', 'tight', 'below-wll'] as const;
export type MarginBand = (typeof MARGIN_BANDS)[number];
export const MARGIN_BAND_LABELS: Readonly<Record<MarginBand, string>> = {
  passes: 'Passes',
  tight: 'Tight',
  'below-wll': 'Below WLL',
};
/** A WLL margin at or above this is "passes"; between 1 and this is "tight". */
export const TIGHT_MARGIN_BELOW = 1.5;
