import type { ClubLocale } from './locale';

export interface HarborDto {
  id: number;
  name: string;
  slug: string;
}
export interface ClubDto {
  name: string;
  harbors: HarborDto[];
  /** How dates, numbers and money read; the currency new prices start in; the default units. */
  locale: ClubLocale;
}
