import '@/testing/setup';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { sendLabel } from '../utils/reminder-label';
import { RemindersPanel } from './reminders-panel';

const session = buildSession(buildUser({ roles: ['member', 'treasurer'] }));
const recipient = (userId: number) => ({
  userId,
  displayName: `Invented ${userId}`,
  email: `m${userId}@example.test`,
  status: 'overdue',
  owedMinor: 6000,
  currency: 'EUR',
});

describe('RemindersPanel', () => {
  it('counts who would be reminded as soon as it renders, before any preview is pressed', async () => {
    const { requests } = mockApi({
      'POST /api/treasury/reminders/preview': () => ({
        status: 200,
        body: {
          data: {
            recipients: [recipient(1), recipient(2), recipient(3)],
            skipped: [{ userId: 4, reason: 'Owes nothing' }],
            subject: 'Your club dues are due',
            sampleText: 'Hello',
          },
        },
      }),
    });
    renderWithProviders(<RemindersPanel userIds={[1, 2, 3, 4]} />, { session });
    expect(await screen.findByRole('button', { name: 'Send 3 reminders' })).toBeEnabled();
    expect(requests[0]?.body).toEqual({ userIds: [1, 2, 3, 4] });
  });

  it('says so when nobody selected would be reminded', () => {
    mockApi({});
    renderWithProviders(<RemindersPanel userIds={[]} />, { session });
    expect(screen.getByRole('button', { name: 'No reminders to send' })).toBeDisabled();
  });

  it('uses the right number', () => {
    expect([sendLabel(1), sendLabel(3), sendLabel(0), sendLabel(undefined)]).toEqual([
      'Send 1 reminder',
      'Send 3 reminders',
      'No reminders to send',
      'Send reminders (counting…)',
    ]);
  });
});
