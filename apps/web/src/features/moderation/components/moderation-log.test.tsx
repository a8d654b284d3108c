import '@/testing/setup';
import type { AuditEntryDto } from '@app/shared';
import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ModerationLog } from './moderation-log';
import { actionWords } from './moderation-log-words';

const entry = (over: Partial<AuditEntryDto>): AuditEntryDto => ({
  id: 1,
  actor: { id: 2, displayName: 'Wren Halyard' },
  action: 'post.publish',
  subjectType: 'post',
  subjectId: '7',
  reason: null,
  details: { title: 'Chafe gear at the fairlead' },
  createdAt: '2026-05-01T10:00:00.000Z',
  ...over,
});

describe('moderation log', () => {
  it('reads new and older action names alike, and names what an undo undid', () => {
    expect(actionWords(entry({ action: 'post.publish' }))).toBe('published a post');
    expect(actionWords(entry({ action: 'post.approve' }))).toBe('published a post');
    expect(actionWords(entry({ action: 'post.request-changes' }))).toBe(
      'sent a post back to its author',
    );
    expect(
      actionWords(entry({ action: 'decision.undo', details: { undid: 'listing.hide' } })),
    ).toBe('undid: hid a listing');
  });

  it('gives each entry a card for phones (status and reason inside) and a table from md up', () => {
    render(
      <ModerationLog
        entries={[
          entry({ id: 1 }),
          entry({ id: 2, action: 'post.decline', reason: 'An advert for a mooring' }),
        ]}
      />,
    );
    const cards = screen.getByRole('list', { name: 'Moderator actions' });
    expect(cards.className).toMatch(/md:hidden/);
    const [first, second] = within(cards).getAllByRole('listitem');
    expect(first).toHaveTextContent('published a post “Chafe gear at the fairlead”');
    expect(second).toHaveTextContent('declined a post');
    expect(second).toHaveTextContent('Why: An advert for a mooring');
    const table = screen.getByRole('table', { name: 'Moderator actions' });
    expect(table.className).toMatch(/hidden .*md:table/);
    expect(within(table).getAllByRole('row')).toHaveLength(3);
  });
});
