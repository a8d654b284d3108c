import '@/testing/setup';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

// Someone else's boat, plan or conversation answers 404; the screen still has its one h1 and a way back.
describe('screens for rows that are not yours', () => {
  it.each([
    ['/boats/41', 'GET /api/boats/41', 'Boat not available', 'Back to your boats'],
    ['/plans/42', 'GET /api/tackle-plans/42', 'Plan not available', 'Back to your boats'],
    ['/messages/43', 'GET /api/threads/43', 'Conversation not available', 'Back to your messages'],
  ])('%s has a page heading, the reason and a link back', async (route, call, title, back) => {
    mockApi({
      [call]: () => errorReply(404, 'NOT_FOUND', 'Not found'),
      'GET /api/threads/unread': () => ({ body: { data: { unread: 0 } } }),
      'GET /api/notifications/unread': () => ({ body: { data: { unread: 0 } } }),
      'GET /api/boats/41/plans': () => errorReply(404, 'NOT_FOUND', 'Not found'),
    });
    renderApp({ route, session: buildSession(buildUser()) });
    expect(await screen.findByRole('heading', { level: 1, name: title })).toBeInTheDocument();
    expect(screen.getByText('Not found')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: back })).toBeInTheDocument();
  });
});
