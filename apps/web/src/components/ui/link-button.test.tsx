import '@/testing/setup';
import { render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { LinkButton } from './link-button';

describe('LinkButton', () => {
  it('is a link to its address, filled by default', () => {
    render(
      <MemoryRouter>
        <LinkButton to="/exchange/new">List gear</LinkButton>
      </MemoryRouter>,
    );
    const link = screen.getByRole('link', { name: 'List gear' });
    expect(link).toHaveAttribute('href', '/exchange/new');
    expect(link).toHaveClass('min-h-11', 'bg-signal-600', 'text-white', 'no-underline');
  });

  it.each([
    ['secondary', ['border', 'bg-sand-50', 'text-ink-900']],
    ['outline', ['border', 'border-sand-500']],
  ] as const)('has the %s look', (variant, classes) => {
    render(
      <MemoryRouter>
        <LinkButton to="/sign-in" variant={variant}>
          Sign in
        </LinkButton>
      </MemoryRouter>,
    );
    const link = screen.getByRole('link', { name: 'Sign in' });
    expect(link).toHaveClass(...classes);
    expect(link).not.toHaveClass('bg-signal-600');
  });
});
