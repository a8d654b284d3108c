import '@/testing/setup';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { FilterParams } from '../utils/filter-draft';
import { SearchFilters } from './search-filters';

const harbors = [{ id: 3, name: 'Test Harbour North' }];

function setup(value: Record<string, string> = {}, debounceMs = 50) {
  const onChange = vi.fn<(next: FilterParams, opts: { typing: boolean }) => void>();
  const view = render(
    <SearchFilters
      value={value}
      harbors={harbors}
      boats={[]}
      onChange={onChange}
      debounceMs={debounceMs}
    />,
  );
  return { onChange, view, user: userEvent.setup() };
}

const defined = (p: FilterParams | undefined) =>
  Object.fromEntries(Object.entries(p ?? {}).filter(([, v]) => v !== undefined));

describe('exchange filters', () => {
  it('apply a list choice at once, without the Search button', async () => {
    const { onChange, user } = setup();
    await user.selectOptions(screen.getByLabelText('Category'), 'chain');
    expect(onChange).toHaveBeenCalledTimes(1);
    expect(defined(onChange.mock.calls[0]?.[0])).toEqual({ category: 'chain' });
    expect(onChange.mock.calls[0]?.[1]).toEqual({ typing: false });
  });

  it('apply the search text once typing pauses, not per key', async () => {
    const { onChange, user } = setup({}, 150);
    await user.type(screen.getByLabelText('Search gear'), 'g43 chain');
    expect(onChange).not.toHaveBeenCalled();
    await waitFor(() => expect(onChange).toHaveBeenCalledTimes(1));
    expect(defined(onChange.mock.calls[0]?.[0])).toEqual({ q: 'g43 chain' });
    expect(onChange.mock.calls[0]?.[1]).toEqual({ typing: true });
  });

  it('read sizes in inches or millimetres and send millimetres', async () => {
    const { onChange, user } = setup();
    await user.type(screen.getByLabelText(/Smallest size/), '5/16');
    // On a loaded machine the pause can fall between keys ("5/1"); the last call is the whole size.
    await waitFor(() => expect(onChange.mock.lastCall?.[0].sizeMinMm).toBe('7.9375'));
    await user.type(screen.getByLabelText(/Largest size/), '12 mm');
    await waitFor(() => expect(onChange.mock.lastCall?.[0].sizeMaxMm).toBe('12'));
  });

  it('show sizes from the address as trade fractions', () => {
    setup({ sizeMinMm: '7.9375', sizeMaxMm: '12.7' });
    expect(screen.getByLabelText(/Smallest size/)).toHaveValue('5/16 in');
    expect(screen.getByLabelText(/Largest size/)).toHaveValue('1/2 in');
  });

  it('name a size it cannot read and send nothing', async () => {
    const { onChange, user } = setup();
    await user.type(screen.getByLabelText(/Smallest size/), 'five');
    expect(await screen.findByText(/Write a size like 8 mm, 5\/16/)).toBeInTheDocument();
    expect(screen.getByLabelText(/Smallest size/)).toHaveAttribute('aria-invalid', 'true');
    expect(onChange).not.toHaveBeenCalled();
  });

  it('fold behind a Filters button that counts the filters in use', async () => {
    const { user } = setup({ category: 'chain', harborId: '3', q: 'chain', sort: 'newest' });
    const toggle = screen.getByRole('button', { name: /^Filters/ });
    expect(toggle).toHaveAccessibleName('Filters, 2 in use');
    expect(toggle).toHaveTextContent('Filters2');
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    const panel = document.getElementById(toggle.getAttribute('aria-controls') ?? '');
    expect(panel).toHaveClass('hidden', 'md:flex');
    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    expect(panel).toHaveClass('flex');
    expect(panel).not.toHaveClass('hidden');
  });

  it('follow the address when it changes by itself (back, a link)', () => {
    const { view } = setup({ q: 'anchor' });
    expect(screen.getByLabelText('Search gear')).toHaveValue('anchor');
    view.rerender(
      <SearchFilters
        value={{ q: 'rode', category: 'rode' }}
        harbors={harbors}
        boats={[]}
        onChange={vi.fn()}
      />,
    );
    expect(screen.getByLabelText('Search gear')).toHaveValue('rode');
    expect(screen.getByLabelText('Category')).toHaveValue('rode');
  });
});
