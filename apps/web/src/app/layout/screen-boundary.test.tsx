import '@/testing/setup';
import { act, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { lazy, Suspense } from 'react';
import { Link, MemoryRouter, Outlet, useRoutes } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { ScreenBoundary } from './screen-boundary';

function Boom(): never {
  throw new Error('The chart could not be drawn.');
}

let finishSlow: (screen: { default: () => React.ReactNode }) => void = () => {};
const Slow = lazy(
  () =>
    new Promise<{ default: () => React.ReactNode }>((resolve) => {
      finishSlow = resolve;
    }),
);

const Missing = lazy(() =>
  Promise.reject(new TypeError('Failed to fetch dynamically imported module: /assets/x.js')),
);

function Shell() {
  return (
    <>
      <nav>
        <Link to="/">Home</Link>
        <Link to="/missing">Missing</Link>
        <Link to="/slow">Slow</Link>
      </nav>
      <ScreenBoundary>
        <Suspense fallback={<p>Loading…</p>}>
          <Outlet />
        </Suspense>
      </ScreenBoundary>
    </>
  );
}

function Routes() {
  return useRoutes([
    {
      path: '/',
      element: <Shell />,
      children: [
        { index: true, element: <h1>Home screen</h1> },
        { path: 'boom', element: <Boom /> },
        { path: 'missing', element: <Missing /> },
        { path: 'slow', element: <Slow /> },
      ],
    },
  ]);
}

const renderAt = (route: string) =>
  render(
    <MemoryRouter initialEntries={[route]}>
      <Routes />
    </MemoryRouter>,
  );

describe('screen boundary', () => {
  it('shows a throwing screen as the error screen inside the shell, and the next address afresh', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => {});
    renderAt('/boom');
    expect(await screen.findByRole('heading', { name: 'Something went wrong' })).toBeVisible();
    // A raw error's own words (perhaps a stack) are never shown.
    expect(screen.queryByText('The chart could not be drawn.')).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('link', { name: 'Home' }));
    expect(await screen.findByRole('heading', { name: 'Home screen' })).toBeVisible();
    expect(screen.queryByText('Something went wrong')).not.toBeInTheDocument();
  });

  it('keeps the screen being left on view, and focus where it was, while the next screen’s code loads', async () => {
    renderAt('/');
    const link = screen.getByRole('link', { name: 'Slow' });
    await userEvent.click(link);
    expect(screen.getByRole('heading', { name: 'Home screen' })).toBeVisible();
    expect(screen.queryByText('Loading…')).not.toBeInTheDocument();
    expect(link).toHaveFocus();
    act(() => finishSlow({ default: () => <h1>Slow screen</h1> }));
    expect(await screen.findByRole('heading', { name: 'Slow screen' })).toBeVisible();
  });

  it('says part of the app did not load when a screen’s code fails to download', async () => {
    vi.spyOn(console, 'error').mockImplementation(() => {});
    renderAt('/');
    await userEvent.click(screen.getByRole('link', { name: 'Missing' }));
    expect(await screen.findByText(/Part of Rodewise did not load/)).toBeVisible();
  });
});
