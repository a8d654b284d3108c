import '@/testing/setup';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { ErrorAlert, QueryStatus } from './query-status';

const labels = { loadingLabel: 'Loading your boats…', errorTitle: "Couldn't load your boats" };

describe('QueryStatus', () => {
  it('shows the spinner with its label while the request runs', () => {
    render(<QueryStatus query={{ isPending: true, isError: false, error: null }} {...labels} />);
    expect(screen.getByRole('status')).toHaveTextContent('Loading your boats…');
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it("shows the title and the server's message when the request failed", () => {
    const error = new ApiError(503, 'NETWORK_ERROR', "Can't reach Rodewise right now.");
    render(<QueryStatus query={{ isPending: false, isError: true, error }} {...labels} />);
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent("Couldn't load your boats");
    expect(alert).toHaveTextContent("Can't reach Rodewise right now.");
    expect(screen.queryByRole('status')).not.toBeInTheDocument();
  });

  it('shows nothing once the data is there', () => {
    const { container } = render(
      <QueryStatus query={{ isPending: false, isError: false, error: null }} {...labels} />,
    );
    expect(container).toBeEmptyDOMElement();
  });
});

describe('ErrorAlert', () => {
  it('never shows the text of an unexpected error', () => {
    render(
      <ErrorAlert title="Couldn't open the card payment page" error={new Error('at x.js:1')} />,
    );
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent("Couldn't open the card payment page");
    expect(alert).toHaveTextContent('Something went wrong. Please try again.');
    expect(alert).not.toHaveTextContent('x.js');
  });
});
