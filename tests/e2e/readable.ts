import type { Page } from 'playwright-core';

/** One thing on a screen a person should not have to decode. */
export interface Unreadable {
  kind: 'iso-date' | 'minor-units' | 'repeated-grade';
  text: string;
}

const SYMBOLS = '€$£¥';
const CODES = 'EUR|USD|GBP|CAD|AUD|NZD|CHF|DKK|SEK|NOK|JPY';
const ISO_DATE = /\b\d{4}-\d{2}-\d{2}\b/g;
// A currency sign or code right before or after a bare integer: no grouping mark, no decimals. A sign that
// starts the next amount ("2026 €120.00") is not read as the end of the year before it.
const SIGN_THEN_INTEGER = new RegExp(
  `(?:[${SYMBOLS}]|\\b(?:${CODES})\\b)\\s?(\\d+)(?!\\d|[.,]\\d)`,
  'g',
);
const INTEGER_THEN_SIGN = new RegExp(
  `(?<![\\d.,])(\\d+)\\s?(?:[${SYMBOLS}]|\\b(?:${CODES})\\b)(?!\\s?\\d)`,
  'g',
);
// Money words next to a bare integer of four digits or more: "amount 6000", "the 12000 expected".
const MONEY_WORD_THEN_INTEGER =
  /\b(?:amount|amounts|total|expected|price|fee|balance)\s+(?:of\s+|was\s+|is\s+)?(\d{4,})\b(?![.,]\d)/gi;
const INTEGER_THEN_MONEY_WORD =
  /(?<![\d.,])\b(\d{4,})\s+(?:expected|due|owed|charged|refunded)\b/gi;
// On one line: a field label "Chain grade" above a list whose first choice is "Grade 30" is not a repeat.
const REPEATED_GRADE = /\bgrade[ \t\u00a0]+grade\b/gi;

/**
 * What in `text` a person would have to decode: ISO dates, money amounts in minor units (only checked when
 * the club's currency has decimals, `currencyDigits` > 0: a bare integer of 1000 or more beside a currency
 * sign or code or a money word), and a grade named twice ("grade Grade 43").
 */
export function findUnreadable(text: string, currencyDigits: number): Unreadable[] {
  const found: Array<Unreadable & { at: number }> = [];
  const around = (index: number, length: number) =>
    text.slice(Math.max(0, index - 30), index + length + 30).replace(/\s+/g, ' ');
  for (const m of text.matchAll(ISO_DATE))
    found.push({ kind: 'iso-date', text: around(m.index, m[0].length), at: m.index });
  if (currencyDigits > 0) {
    const seen = new Set<number>(); // one finding per number, however many patterns see it
    for (const re of [
      SIGN_THEN_INTEGER,
      INTEGER_THEN_SIGN,
      MONEY_WORD_THEN_INTEGER,
      INTEGER_THEN_MONEY_WORD,
    ])
      for (const m of text.matchAll(re)) {
        const at = m.index + m[0].indexOf(m[1] ?? '');
        if (Number(m[1]) < 1000 || seen.has(at)) continue;
        seen.add(at);
        found.push({ kind: 'minor-units', text: around(m.index, m[0].length), at });
      }
  }
  for (const m of text.matchAll(REPEATED_GRADE))
    found.push({ kind: 'repeated-grade', text: around(m.index, m[0].length), at: m.index });
  return found.sort((a, b) => a.at - b.at).map(({ kind, text: t }) => ({ kind, text: t }));
}

/**
 * The page's visible text as a person reads it: `document.body.innerText` (hidden elements left out), which
 * never includes what is typed in inputs; option labels of selects are read like any other text.
 */
export function visibleText(page: Page): Promise<string> {
  return page.evaluate(() => document.body.innerText);
}
