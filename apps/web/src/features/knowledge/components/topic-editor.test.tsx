import '@/testing/setup';
import type { TopicDto } from '@app/shared';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi, type MockRequest } from '@/testing/mock-api';
import { renderApp } from '@/testing/render';

const topic = (id: number, name: string, postCount = 0): TopicDto => ({
  id,
  slug: name.toLowerCase().replace(/\s+/g, '-'),
  name,
  description: '',
  position: id * 10,
  retired: false,
  postCount,
});

/** A tiny in-memory topics API with the server's own rules for names and order. */
function topicsApi() {
  let topics = [topic(1, 'Anchoring', 4), topic(2, 'Rode and chain', 2), topic(3, 'Splicing')];
  const byId = (url: string) => Number(url.split('/').pop());
  const patch = (request: MockRequest) => {
    const id = byId(request.url);
    const body = request.body as Partial<TopicDto>;
    if (body.name && topics.some((t) => t.id !== id && t.name === body.name))
      return errorReply(409, 'CONFLICT', 'A topic with that name already exists', {
        name: 'Another topic has this name',
      });
    topics = topics.map((t) => (t.id === id ? { ...t, ...body } : t));
    return { body: { data: topics.find((t) => t.id === id) } };
  };
  const routes = {
    'GET /api/club': () => ({
      body: { data: { name: 'Gullwing Cove Cruising Club', harbors: [] } },
    }),
    'GET /api/topics': () => ({ body: { data: topics } }),
    'POST /api/topics': (request: MockRequest) => {
      const body = request.body as { name: string; description: string };
      const created = { ...topic(topics.length + 1, body.name), description: body.description };
      topics = [...topics, created];
      return { status: 201, body: { data: created } };
    },
    'PUT /api/topics/order': (request: MockRequest) => {
      const ids = (request.body as { topicIds: number[] }).topicIds;
      topics = ids.map((id) => topics.find((t) => t.id === id) as TopicDto);
      return { body: { data: topics } };
    },
    'DELETE /api/topics/3': () => {
      topics = topics.filter((t) => t.id !== 3);
      return { status: 204 };
    },
  } as Record<string, (r: MockRequest) => { status?: number; body?: unknown }>;
  for (const id of [1, 2, 3]) routes[`PATCH /api/topics/${id}`] = patch;
  return mockApi(routes);
}

const admin = buildSession(buildUser({ roles: ['member', 'admin'] }));
const names = async () =>
  within(await screen.findByRole('list', { name: 'Topics, in the order members see them' }))
    .getAllByRole('heading', { level: 3 })
    .map((h) => h.textContent);

describe('topic editor (admin)', () => {
  it('moves a topic down with one PUT of the whole order', async () => {
    const { requests } = topicsApi();
    renderApp({ route: '/admin/topics', session: admin });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Move “Anchoring” down' }));
    await screen.findByRole('button', { name: 'Move “Anchoring” up' });
    expect(await names()).toEqual(['Rode and chain', 'Anchoring', 'Splicing']);
    expect(requests.filter((r) => r.method === 'PUT').map((r) => r.body)).toEqual([
      { topicIds: [2, 1, 3] },
    ]);
    expect(screen.getByRole('button', { name: 'Move “Rode and chain” up' })).toBeDisabled();
  });

  it('renames a topic, and shows the server’s message on the name when it is taken', async () => {
    topicsApi();
    renderApp({ route: '/admin/topics', session: admin });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Rename “Rode and chain”' }));
    const field = screen.getAllByLabelText(/Topic name/)[0] as HTMLInputElement;
    expect(field).toHaveValue('Rode and chain');
    await user.clear(field);
    await user.type(field, 'Anchoring');
    await user.click(screen.getByRole('button', { name: 'Save topic' }));
    expect(await screen.findByText('Another topic has this name')).toBeInTheDocument();
    expect(field).toHaveValue('Anchoring');
    await user.clear(field);
    await user.type(field, 'Rode, chain and rope');
    await user.click(screen.getByRole('button', { name: 'Save topic' }));
    expect(await screen.findByText('Saved “Rode, chain and rope”.')).toBeInTheDocument();
    expect(await names()).toContain('Rode, chain and rope');
  });

  it('retires and restores a topic, and checks a new topic’s name before sending it', async () => {
    const { requests } = topicsApi();
    renderApp({ route: '/admin/topics', session: admin });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Retire “Anchoring”' }));
    expect(await screen.findByText('“Anchoring” is retired.')).toBeInTheDocument();
    expect(screen.getByText('Retired')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Restore “Anchoring”' }));
    expect(await screen.findByText('“Anchoring” is offered again.')).toBeInTheDocument();
    expect(requests.filter((r) => r.method === 'PATCH').map((r) => [r.url, r.body])).toEqual([
      ['/api/topics/1', { retired: true }],
      ['/api/topics/1', { retired: false }],
    ]);

    const add = within(screen.getByRole('region', { name: 'Add a topic' }));
    await user.type(add.getByLabelText(/Topic name/), 'x');
    await user.click(add.getByRole('button', { name: 'Add topic' }));
    expect(await add.findByText('Name the topic')).toBeInTheDocument();
    expect(requests.some((r) => r.method === 'POST')).toBe(false);
    await user.type(add.getByLabelText(/Topic name/), 'y marks');
    await user.click(add.getByRole('button', { name: 'Add topic' }));
    expect(await screen.findByText('Added “xy marks”.')).toBeInTheDocument();
    expect(add.getByLabelText(/Topic name/)).toHaveValue('');
  });

  it('deletes only an unused topic, after asking', async () => {
    const { requests } = topicsApi();
    renderApp({ route: '/admin/topics', session: admin });
    const user = userEvent.setup();
    await screen.findByRole('button', { name: 'Retire “Anchoring”' });
    expect(screen.queryByRole('button', { name: 'Delete “Anchoring”' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Delete “Splicing”' }));
    await user.click(await screen.findByRole('button', { name: 'Delete topic' }));
    expect(await screen.findByText('Deleted “Splicing”.')).toBeInTheDocument();
    expect(requests.filter((r) => r.method === 'DELETE').map((r) => r.url)).toEqual([
      '/api/topics/3',
    ]);
  });

  it('is reachable from the admin area', async () => {
    mockApi({
      'GET /api/club': () => ({ body: { data: { name: 'Gullwing Cove', harbors: [] } } }),
      'GET /api/admin/users': () => ({ body: { data: [] } }),
    });
    renderApp({ route: '/admin/users', session: admin });
    const sections = await screen.findByRole('navigation', { name: 'Admin sections' });
    expect(within(sections).getByRole('link', { name: 'Topics' })).toHaveAttribute(
      'href',
      '/admin/topics',
    );
  });
});
