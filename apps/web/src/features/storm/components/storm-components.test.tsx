import '@/testing/setup';
import type { ReadinessDto } from '@app/shared';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/render';
import { BoardTable } from './board-table';
import { MarginBadge } from './margin-badge';
import { ReadinessForm } from './readiness-form';

function row(overrides: Partial<ReadinessDto> = {}): ReadinessDto {
  return {
    boatId: 4,
    boatName: 'Invented Tern',
    ownerId: 9,
    ownerName: 'Invented Owner',
    harborId: 1,
    status: 'in-progress',
    mine: false,
    details: null,
    ...overrides,
  };
}

describe('MarginBadge', () => {
  it.each([
    ['passes', 'Passes'],
    ['tight', 'Tight'],
    ['below-wll', 'Below WLL'],
  ] as const)('says %s in words, with the figure, not by colour alone', (band, word) => {
    renderWithProviders(<MarginBadge band={band} margin={0.4567} />);
    expect(screen.getByText(word)).toBeInTheDocument();
    expect(screen.getByText('(0.46 × WLL)')).toBeInTheDocument();
  });

  it('says when there is nothing to check', () => {
    renderWithProviders(<MarginBadge band={null} />);
    expect(screen.getByText('No rated parts')).toBeInTheDocument();
  });
});

describe('BoardTable', () => {
  it('shows another member’s boat by name and status only, and flags a plan below its WLL', () => {
    const flagged = row({
      boatId: 5,
      boatName: 'Invented Marram',
      mine: true,
      details: {
        location: 'own-anchor',
        planId: 2,
        depthM: null,
        ticked: ['a'],
        helpWanted: false,
        helpNote: '',
        buddy: { id: 3, name: 'Invented Buddy' },
        updatedAt: null,
        check: {
          planId: 2,
          planName: 'Storm plan',
          windKn: 70,
          sustainedKn: 55,
          loadN: 17000,
          band: 'below-wll',
          weakestLink: { label: 'anchor shackle', wllMargin: 0.2, breakFactor: 1 },
          sustainedMargin: 0.3,
          parts: [],
          depthM: 6,
          tideM: 2,
          scopeRatio: 7,
          recommended: null,
          warnings: [],
          cautions: [],
          basis: '',
        },
      },
    });
    renderWithProviders(
      <BoardTable
        watchId={1}
        rows={[row(), flagged]}
        harbors={[{ id: 1, name: 'Invented Harbour', slug: 'h' }]}
        checklistLength={7}
      />,
    );
    expect(screen.getByText('Not shared')).toBeInTheDocument();
    expect(screen.getByText('Below WLL')).toBeInTheDocument();
    expect(screen.getByText('Flagged: below WLL at the gust')).toBeInTheDocument();
    expect(screen.getByText('Weakest: anchor shackle')).toBeInTheDocument();
    expect(screen.getByText('Invented Buddy')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Invented Marram' })).toHaveAttribute(
      'href',
      '/storm/1/boats/5',
    );
    expect(screen.queryByRole('link', { name: 'Invented Tern' })).toBeNull();
  });
});

describe('ReadinessForm', () => {
  it('sends the choices, and refuses a bad depth on the field without sending', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn(() => Promise.resolve());
    renderWithProviders(
      <ReadinessForm
        readiness={row({ mine: true })}
        checklist={[
          { id: 'chafe-gear', label: 'Chafe gear' },
          { id: 'snubbers', label: 'Doubled snubbers' },
        ]}
        plans={[{ id: 8, name: 'Storm plan', windKn: 50 }]}
        isPending={false}
        onSubmit={onSubmit}
      />,
    );
    await user.selectOptions(screen.getByLabelText('Where the boat will be'), 'own-anchor');
    await user.selectOptions(screen.getByLabelText(/^Tackle plan/), '8');
    await user.type(screen.getByLabelText(/^Depth where the boat will lie/), '-2');
    await user.click(screen.getByRole('checkbox', { name: 'Chafe gear' }));
    await user.click(screen.getByRole('button', { name: 'Save readiness' }));
    expect(await screen.findByText('Depth must be at least 0.5 m')).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();
    await user.clear(screen.getByLabelText(/^Depth where the boat will lie/));
    await user.type(screen.getByLabelText(/^Depth where the boat will lie/), '6');
    await user.click(screen.getByRole('button', { name: 'Save readiness' }));
    expect(onSubmit).toHaveBeenCalledWith({
      location: 'own-anchor',
      planId: 8,
      depthM: 6,
      ticked: ['chafe-gear'],
      helpWanted: false,
      helpNote: '',
    });
  });
});
