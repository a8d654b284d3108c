import '@/testing/setup';
import type { PlanDto } from '@app/shared';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { renderWithProviders } from '@/testing/render';
import { MembershipPlanForm } from './membership-plan-form';

const family: PlanDto = {
  id: 4,
  code: 'family',
  name: 'Family',
  kind: 'family',
  description: 'Two adults and their children',
  amountMinor: 18000,
  currency: 'EUR',
  proration: 'quarterly',
  lateFeeMinor: 2000,
  graceDays: 30,
  active: true,
};

describe('MembershipPlanForm', () => {
  it('turns typed money into minor units and sends the rule the treasurer picked', async () => {
    const onSubmit = vi.fn(() => Promise.resolve());
    renderWithProviders(<MembershipPlanForm isPending={false} onSubmit={onSubmit} />);
    const user = userEvent.setup();
    await user.type(screen.getByLabelText(/^Plan name/), 'Junior crew');
    await user.type(screen.getByLabelText(/^Code/), 'junior-crew');
    await user.selectOptions(screen.getByLabelText('Who it is for'), 'junior');
    await user.type(screen.getByLabelText(/^Annual amount/), '45,50');
    await user.click(screen.getByLabelText('By remaining days'));
    await user.clear(screen.getByLabelText(/^Late fee/));
    await user.type(screen.getByLabelText(/^Late fee/), '5');
    await user.click(screen.getByRole('button', { name: 'Create plan' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledTimes(1));
    expect(onSubmit).toHaveBeenCalledWith({
      code: 'junior-crew',
      name: 'Junior crew',
      kind: 'junior',
      description: '',
      amountMinor: 4550,
      currency: 'EUR',
      proration: 'daily',
      lateFeeMinor: 500,
      graceDays: 30,
      active: true,
    });
  });

  it('refuses a negative or too-precise amount and an unknown currency before sending', async () => {
    const onSubmit = vi.fn(() => Promise.resolve());
    renderWithProviders(<MembershipPlanForm isPending={false} onSubmit={onSubmit} />);
    const user = userEvent.setup();
    await user.type(screen.getByLabelText(/^Plan name/), 'Crew');
    await user.type(screen.getByLabelText(/^Code/), 'crew');
    await user.type(screen.getByLabelText(/^Annual amount/), '-12');
    await user.clear(screen.getByLabelText(/^Currency/));
    await user.type(screen.getByLabelText(/^Currency/), 'E1');
    await user.click(screen.getByRole('button', { name: 'Create plan' }));
    expect(await screen.findByLabelText(/^Annual amount/)).toHaveAccessibleDescription(
      expect.stringMatching(/no minus sign/),
    );
    expect(screen.getByLabelText(/^Currency/)).toHaveAttribute('aria-invalid', 'true');
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('starts from the plan, keeps the code fixed and puts server errors on the money field', async () => {
    const onSubmit = vi.fn(() =>
      Promise.reject(
        new ApiError(400, 'VALIDATION_FAILED', 'Some fields need attention', {
          currency: '3 payments were made in EUR on this plan',
        }),
      ),
    );
    renderWithProviders(<MembershipPlanForm plan={family} isPending={false} onSubmit={onSubmit} />);
    expect(screen.getByLabelText(/^Annual amount/)).toHaveValue('180.00');
    expect(screen.getByLabelText(/^Late fee/)).toHaveValue('20.00');
    expect(screen.getByLabelText(/^Code/)).toHaveAttribute('readonly');
    expect(screen.getByLabelText(/By remaining quarters/)).toBeChecked();
    const user = userEvent.setup();
    await user.clear(screen.getByLabelText(/^Currency/));
    await user.type(screen.getByLabelText(/^Currency/), 'GBP');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() =>
      expect(screen.getByLabelText(/^Currency/)).toHaveAccessibleDescription(
        expect.stringContaining('3 payments were made in EUR'),
      ),
    );
  });
});
