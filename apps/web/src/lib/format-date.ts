import { formatDate } from '@app/shared/locale';

/**
 * A calendar date (YYYY-MM-DD) or an ISO instant as people read it, in the club's region
 * ("2026-10-23" → "23 Oct 2026" in en-GB, "Oct 23, 2026" in en-US); see `formatDate` in @app/shared.
 */
export const readableDate = (value: string): string => formatDate(value);
