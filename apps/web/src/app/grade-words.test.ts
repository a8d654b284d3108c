import { CHAIN_GRADE_LABELS, CHAIN_GRADES, chainGradeWords } from '@app/calc';
import { describe, expect, it } from 'vitest';
import { specDetails } from '@/features/exchange/utils/format';
import { ratePart } from '@/features/calculators/utils/link-parts';

// Spans two features (calculators and exchange), so it lives with the app shell that combines them.
// Every place that writes a chain grade in words: the weakest-link part names, the exchange's spec rows
// and card lines. Each grade is named once, as "grade 43" or as its label ("Grade 43 high test").
const doubled = /\bgrade\s+grade\b/i;

describe('chain grades in words', () => {
  it.each(CHAIN_GRADES)('%s reads once in every form', (grade) => {
    const number = grade.slice(1);
    expect(chainGradeWords(grade)).toBe(`grade ${number}`);
    expect(CHAIN_GRADE_LABELS[grade]).toMatch(new RegExp(`^Grade ${number}\\b`));

    const sizes = { G30: 0.375, G43: 0.375, G70: 0.375, G80: 0.375, G100: 0.375 } as const;
    const part = ratePart({ kind: 'chain', grade, tradeSizeIn: sizes[grade] } as never, 0);
    expect(part.label).toBe(`3/8 in grade ${number} chain`);

    const rows = specDetails('chain', { grade, tradeSizeIn: 0.375, lengthM: 30 });
    const gradeRow = rows.find((r) => r.label === 'Grade');
    expect(gradeRow?.short).toBe(`grade ${number}`);
    expect(`${gradeRow?.label} ${gradeRow?.value}`).not.toMatch(doubled);
    for (const r of rows) expect(`${r.label} ${r.value} · ${r.short}`).not.toMatch(doubled);
    expect(part.label).not.toMatch(doubled);
  });
});
