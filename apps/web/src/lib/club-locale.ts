import { DEFAULT_CLUB_LOCALE, setDisplayLocale, type ClubLocale } from '@app/shared/locale';

let current: ClubLocale = DEFAULT_CLUB_LOCALE;

/**
 * Reads the club's locale the server wrote into index.html (`<meta name="rw-locale" content="en-GB|EUR|metric">`),
 * so the very first render already formats dates and money the club's way. Without it (the Vite dev server) the
 * defaults hold until GET /api/club answers.
 */
export function readClubLocaleFromPage(doc: Document = document) {
  const content = doc.querySelector('meta[name="rw-locale"]')?.getAttribute('content');
  const [region, currency, unitSystem] = (content ?? '').split('|');
  if (region && currency && (unitSystem === 'metric' || unitSystem === 'imperial'))
    applyClubLocale({ region: region as ClubLocale['region'], currency, unitSystem });
}

/** Makes `locale` the one every formatter and default uses. */
export function applyClubLocale(locale: ClubLocale) {
  current = locale;
  setDisplayLocale(locale.region);
}

/** The club's locale: region for formats, the currency new prices start in, and visitors' default units. */
export const clubLocale = () => current;
