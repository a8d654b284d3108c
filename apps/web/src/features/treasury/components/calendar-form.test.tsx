import '@/testing/setup';
import type { DuesCalendarDto } from '@app/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { CalendarForm } from './calendar-form';

const view = (start: string, end: string, joinMinor: number): DuesCalendarDto => ({
  calendar: {
    fiscalYearStartMonth: Number(start.slice(5, 7)),
    fiscalYearStartDay: Number(start.slice(8, 10)),
    renewalWindowDays: 30,
    lapseAfterDays: 90,
  },
  today: '2026-12-02',
  fiscalYear: { start, end, label: '2026–27' },
  nextFiscalYear: { start: '2027-07-15', end: '2028-07-14', label: '2027–28' },
  joinToday: [
    {
      planId: 1,
      planName: 'Individual',
      proration: 'monthly',
      currency: 'EUR',
      fullMinor: 12000,
      joinMinor,
      coversFrom: '2026-12-02',
      coversTo: end,
    },
  ],
});

describe('CalendarForm', () => {
  it('previews a proposed start from the server before saving, then saves what was typed', async () => {
    const saved = view('2026-04-01', '2027-03-31', 5000);
    const { requests } = mockApi({
      'GET /api/treasury/calendar/preview': () => ({
        body: { data: view('2026-07-15', '2027-07-14', 8000) },
      }),
    });
    const onSubmit = vi.fn(() => Promise.resolve());
    renderWithProviders(<CalendarForm saved={saved} isPending={false} onSubmit={onSubmit} />);
    expect(screen.getByTestId('fy-start')).toHaveTextContent('1 Apr 2026');
    expect(screen.getByTestId('fy-start').querySelector('time')).toHaveAttribute(
      'datetime',
      '2026-04-01',
    );
    expect(screen.getByRole('cell', { name: '€50.00' })).toBeInTheDocument();
    const user = userEvent.setup();
    await user.selectOptions(screen.getByLabelText('Fiscal year starts in'), '7');
    await user.clear(screen.getByLabelText(/^on day/));
    await user.type(screen.getByLabelText(/^on day/), '15');
    await waitFor(() => expect(screen.getByTestId('fy-start')).toHaveTextContent('15 Jul 2026'));
    expect(screen.getByRole('heading', { name: /not saved yet/ })).toBeInTheDocument();
    expect(screen.getByRole('cell', { name: '€80.00' })).toBeInTheDocument();
    expect(requests.at(-1)?.url).toMatch(/fiscalYearStartMonth=7&fiscalYearStartDay=15/);
    expect(onSubmit).not.toHaveBeenCalled();

    await user.click(screen.getByRole('button', { name: 'Save the calendar' }));
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith({
        fiscalYearStartMonth: 7,
        fiscalYearStartDay: 15,
        renewalWindowDays: 30,
        lapseAfterDays: 90,
      }),
    );
  });

  it('refuses a day past the 28th without previewing or saving it', async () => {
    const { requests } = mockApi({});
    const onSubmit = vi.fn(() => Promise.resolve());
    renderWithProviders(
      <CalendarForm
        saved={view('2026-04-01', '2027-03-31', 5000)}
        isPending={false}
        onSubmit={onSubmit}
      />,
    );
    const user = userEvent.setup();
    await user.clear(screen.getByLabelText(/^on day/));
    await user.type(screen.getByLabelText(/^on day/), '31');
    await user.click(screen.getByRole('button', { name: 'Save the calendar' }));
    expect(await screen.findByLabelText(/^on day/)).toHaveAccessibleDescription(
      expect.stringContaining('between 1 and 28'),
    );
    expect(onSubmit).not.toHaveBeenCalled();
    // Typing "31" passes through day 3, which may be previewed; day 31 never is.
    expect(requests.filter((r) => /fiscalYearStartDay=31/.test(r.url))).toEqual([]);
  });
});
