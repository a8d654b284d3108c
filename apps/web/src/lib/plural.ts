// One helper for counted words in screens and mails: English plural rules, the club's number format.
export { countOf } from '@app/shared/locale';
