import '@/testing/setup';
import type { ListingSummaryDto } from '@app/shared';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { specRows } from '../utils/format';
import { ListingCard } from './listing-card';

const chain = (specs: Record<string, unknown>): ListingSummaryDto => ({
  id: 1,
  category: 'chain',
  title: 'Spare chain',
  condition: 'good',
  priceCents: 10000,
  currency: 'EUR',
  harborId: 1,
  harborName: 'Test Harbour',
  specs,
  sizeMm: 7.9,
  thumbUrl: null,
  sellerName: 'Test Seller',
  publishedAt: '2026-11-01T10:00:00.000Z',
});

describe('listing labels', () => {
  it('says each spec once on a card: grade 43, a trade fraction, the length', () => {
    renderWithProviders(
      <ul>
        <ListingCard
          listing={chain({ grade: 'G43', tradeSizeIn: 0.3125, lengthM: 40, galvanizing: 'good' })}
          href="/exchange/listings/1"
        />
      </ul>,
    );
    const line = screen.getByText(/grade 43/);
    expect(line).toHaveTextContent('Good, light wear · grade 43 · 5/16 in · 40 m');
    expect(line.textContent).not.toMatch(/grade grade/i);
  });

  it('writes imperial sizes as trade fractions and labels each detail row once', () => {
    const rows = Object.fromEntries(
      specRows('chain', { grade: 'G43', tradeSizeIn: 1.125, lengthM: 20, galvanizing: 'patchy' }),
    );
    expect(rows.Size).toBe('1 1/8 in');
    expect(rows.Grade).toBe('43 (high test)');
    for (const [label, value] of Object.entries(rows))
      expect(value.toLowerCase()).not.toContain(label.toLowerCase());
    const shackle = Object.fromEntries(
      specRows('connector', { kind: 'shackle', nominalIn: 0.4375 }),
    );
    expect(shackle.Size).toBe('7/16 in');
  });
});
