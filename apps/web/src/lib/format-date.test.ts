import { describe, expect, it } from 'vitest';
import { readableDate } from './format-date';

describe('readableDate', () => {
  it('writes a calendar date for people, never as YYYY-MM-DD', () => {
    const text = readableDate('2026-10-23');
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
    expect(text).toContain('2026');
    expect(text).toContain('23');
  });

  it('keeps a calendar date on its day', () => {
    expect(readableDate('2026-01-01')).toContain('1');
    expect(readableDate('2026-01-01')).not.toContain('2025');
  });

  it('passes text that is no date through unchanged', () => {
    expect(readableDate('soon')).toBe('soon');
  });
});
