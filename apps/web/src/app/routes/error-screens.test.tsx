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

// A malformed id in the address never reaches the API: the screen says the link is wrong.
describe('screens addressed by a malformed id', () => {
  it.each([
    ['/boats/abc', 'Boat not available', 'No such boat', 'Back to your boats'],
    ['/plans/0', 'Plan not available', 'No such plan', 'Back to your boats'],
    ['/storm/1.5', 'Storm watch not available', 'No such storm watch', 'Back to storm watches'],
    ['/storm/-2/board', 'Board not available', 'No such storm watch', 'Back to storm watches'],
    ['/storm/3/boats/x', 'Boat not available', 'No such boat or watch', 'Back to storm watches'],
  ])('%s says to check the link', async (route, title, reason, back) => {
    mockApi({
      'GET /api/threads/unread': () => ({ body: { data: { unread: 0 } } }),
      'GET /api/notifications/unread': () => ({ body: { data: { unread: 0 } } }),
    });
    renderApp({ route, session: buildSession(buildUser()) });
    expect(await screen.findByRole('heading', { level: 1, name: title })).toBeInTheDocument();
    expect(screen.getByText(reason)).toBeInTheDocument();
    expect(screen.getByText('Check the link and try again.')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: back })).toBeInTheDocument();
  });
});
