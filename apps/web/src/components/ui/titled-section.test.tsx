import '@/testing/setup';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { TitledSection } from './titled-section';

describe('TitledSection', () => {
  it('is a region named by its own h2 heading, with the content inside it', () => {
    render(
      <TitledSection headingId="boats-heading" title="Your boats">
        <p>Two boats</p>
      </TitledSection>,
    );
    const region = screen.getByRole('region', { name: 'Your boats' });
    const heading = screen.getByRole('heading', { level: 2, name: 'Your boats' });
    expect(region).toContainElement(heading);
    expect(region).toHaveAttribute('aria-labelledby', 'boats-heading');
    expect(heading).toHaveAttribute('id', 'boats-heading');
    expect(region).toHaveTextContent('Two boats');
    expect(region).toHaveClass('flex', 'flex-col', 'gap-3');
    expect(heading).toHaveClass('text-xl');
  });

  it('takes an h3 heading and its own classes for a section inside another one', () => {
    render(
      <TitledSection
        headingId="new-plan-heading"
        title="New plan"
        level={3}
        className="rounded-lg p-4"
        headingClassName="mb-3 text-lg"
      />,
    );
    const region = screen.getByRole('region', { name: 'New plan' });
    expect(region).toHaveClass('rounded-lg', 'p-4');
    expect(region).not.toHaveClass('gap-3');
    expect(screen.getByRole('heading', { level: 3, name: 'New plan' })).toHaveClass(
      'mb-3',
      'text-lg',
    );
  });
});
