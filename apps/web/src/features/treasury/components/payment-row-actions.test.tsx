import '@/testing/setup';
import type { PaymentDto } from '@app/shared';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { PaymentRowActions } from './payment-row-actions';

const session = buildSession(buildUser({ roles: ['member', 'treasurer'] }));

function buildPayment(overrides: Partial<PaymentDto> = {}): PaymentDto {
  return {
    id: 7,
    userId: 3,
    memberName: 'Invented Member',
    planName: 'Family',
    method: 'cheque',
    status: 'succeeded',
    amountMinor: 18000,
    currency: 'EUR',
    expectedMinor: 18000,
    refundedMinor: 0,
    coversFrom: '2026-04-01',
    coversTo: '2027-03-31',
    reference: 'CHQ 1',
    note: null,
    heldReason: null,
    cardRefundBlocked: null,
    paidAt: '2026-04-03T10:00:00.000Z',
    createdAt: '2026-04-03T10:00:00.000Z',
    refunds: [],
    ...overrides,
  };
}

const refundReply = (amountMinor: number, status = 'succeeded') => ({
  status: 201,
  body: {
    data: {
      id: 1,
      paymentId: 7,
      amountMinor,
      currency: 'EUR',
      status,
      reason: 'x',
      createdAt: '2026-05-01T00:00:00.000Z',
      completedAt: null,
    },
  },
});

describe('PaymentRowActions', () => {
  it('refunds part of a payment after checking the amount against what is left', async () => {
    const { requests } = mockApi({
      'POST /api/treasury/payments/7/refunds': () => refundReply(3000),
    });
    // 50.00 of 180.00 already refunded (pending counts too), so 130.00 is left.
    const payment = buildPayment({
      refunds: [
        {
          id: 9,
          paymentId: 7,
          amountMinor: 5000,
          currency: 'EUR',
          status: 'pending',
          reason: 'Earlier',
          returnedBy: null,
          createdAt: '2026-04-10T00:00:00.000Z',
          completedAt: null,
        },
      ],
    });
    renderWithProviders(<PaymentRowActions payment={payment} />, { session });
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: /^Refund Invented Member/ }));
    // The dialog's code loads when it is first opened.
    const dialog = await screen.findByRole('dialog', { name: 'Refund Invented Member' });
    const amount = within(dialog).getByLabelText(/^Amount to refund/);
    expect(amount).toHaveValue('130.00');
    await user.clear(amount);
    await user.type(amount, '130.01');
    await user.type(within(dialog).getByLabelText(/^Reason/), 'Moved away mid-season');
    await user.click(within(dialog).getByRole('button', { name: 'Refund' }));
    // The first check waits for the form schemas to load (they are not part of the first load).
    await waitFor(() =>
      expect(amount).toHaveAccessibleDescription(
        expect.stringContaining('At most €130.00 is left to refund'),
      ),
    );
    expect(requests).toHaveLength(0);

    await user.clear(amount);
    await user.type(amount, '30');
    await user.click(within(dialog).getByRole('button', { name: 'Refund' }));
    await waitFor(() => expect(screen.getByRole('status')).toHaveTextContent('Refunded €30.00.'));
    expect(requests[0]?.body).toEqual({ amountMinor: 3000, reason: 'Moved away mid-season' });
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
  });

  it('keeps the dialog open with the provider’s reason when the refund is refused', async () => {
    mockApi({
      'POST /api/treasury/payments/7/refunds': () =>
        errorReply(409, 'CONFLICT', 'The payment provider has no record of this card payment'),
    });
    renderWithProviders(<PaymentRowActions payment={buildPayment({ method: 'card' })} />, {
      session,
    });
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: /^Refund Invented Member/ }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText(/^Reason/), 'Duplicate payment');
    await user.click(within(dialog).getByRole('button', { name: 'Refund' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(/no record of this card/);
    expect(within(dialog).getByLabelText(/^Reason/)).toHaveValue('Duplicate payment');
  });

  it('says why a card payment without a provider reference cannot be refunded', () => {
    mockApi({});
    renderWithProviders(
      <PaymentRowActions
        payment={buildPayment({
          method: 'card',
          cardRefundBlocked: 'No reference at the provider',
        })}
      />,
      { session },
    );
    expect(screen.getByText('No reference at the provider')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Refund/ })).not.toBeInTheDocument();
  });

  it('credits a held payment with the reason typed in the dialog, and sends nothing on cancel', async () => {
    const resolve = vi.fn(() => ({ body: { data: buildPayment() } }));
    const { requests } = mockApi({ 'POST /api/treasury/payments/7/resolve': resolve });
    renderWithProviders(<PaymentRowActions payment={buildPayment({ status: 'held' })} />, {
      session,
    });
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Dismiss' }));
    await user.click(within(screen.getByRole('dialog')).getByRole('button', { name: 'Cancel' }));
    expect(requests).toHaveLength(0);

    await user.click(screen.getByRole('button', { name: 'Credit' }));
    const dialog = screen.getByRole('dialog', { name: /Credit €180.00 to Invented Member/ });
    await user.type(within(dialog).getByLabelText('Why credit this payment'), 'Paid the old rate');
    await user.click(within(dialog).getByRole('button', { name: 'Credit' }));
    await waitFor(() => expect(screen.getByRole('status')).toHaveTextContent('Credited.'));
    expect(requests[0]?.body).toEqual({ decision: 'credit', note: 'Paid the old rate' });
  });

  it('offers recording the money returned another way when the provider refuses, and records it', async () => {
    const { requests } = mockApi({
      'POST /api/treasury/payments/7/refunds': () =>
        errorReply(409, 'CONFLICT', 'The payment provider has no record of this card payment'),
      'POST /api/treasury/payments/7/returned': () => ({
        status: 201,
        body: {
          data: {
            id: 2,
            paymentId: 7,
            amountMinor: 18000,
            currency: 'EUR',
            status: 'succeeded',
            reason: 'Sent by transfer RW-1',
            returnedBy: 'transfer',
            createdAt: '2026-05-01T00:00:00.000Z',
            completedAt: '2026-05-01T00:00:00.000Z',
          },
        },
      }),
    });
    renderWithProviders(<PaymentRowActions payment={buildPayment({ method: 'card' })} />, {
      session,
    });
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: /^Refund Invented Member/ }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText(/^Reason/), 'Duplicate payment');
    await user.click(within(dialog).getByRole('button', { name: 'Refund' }));
    await user.click(await within(dialog).findByRole('button', { name: 'Record money returned' }));
    expect(within(dialog).getByRole('heading')).toHaveTextContent(
      'Record money returned to Invented Member',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Record €180.00 returned' }));
    expect(within(dialog).getByLabelText(/^Note/)).toHaveAccessibleDescription(
      expect.stringContaining('Say how and when'),
    );
    await user.type(within(dialog).getByLabelText(/^Note/), 'Sent by transfer RW-1');
    await user.click(within(dialog).getByRole('button', { name: 'Record €180.00 returned' }));
    await waitFor(() =>
      expect(screen.getByRole('status')).toHaveTextContent('Recorded €180.00 returned'),
    );
    expect(requests.map((r) => r.body)).toEqual([
      { amountMinor: 18000, reason: 'Duplicate payment' },
      { method: 'transfer', note: 'Sent by transfer RW-1' },
    ]);
  });
});
