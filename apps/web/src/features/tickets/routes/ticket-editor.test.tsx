import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { session } from '../../../lib/session';
import { fakeApi, json, problem } from '../../../test/fake-api';
import type { Ticket } from '../api/ticket-queries';
import { frontDeskMe, openTicketEditor, pickerReplies, serviceLine, services, stylistMe, ticket, tobyId, wrenId } from '../components/ticket-test-kit';

const ticketPath = '/api/tickets/70000000-0000-4000-8000-000000000001';

beforeAll(async () => {
  // The first import of Blueprint and the route is slow on a busy machine; keep it outside the tests' clocks.
  await import('./ticket-editor.route');
}, 60_000);

afterEach(() => session.end());

const withColour = (overrides: Partial<Ticket> = {}): Ticket =>
  ticket({
    serviceLines: [serviceLine()],
    totals: { services: '125.00', retail: '0.00', tax: '0.00', tips: '0.00', total: '125.00', paid: '0.00', due: '125.00' },
    ...overrides,
  });

describe('ticket editor', () => {
  it('asks before colour for a client with no patch test, and goes ahead only when confirmed', async () => {
    const caution =
      'This client has no patch test on record. Common practice is a skin test 48 hours before colour; licensed practice and local codes govern. Confirm to go ahead.';
    const api = fakeApi({
      ...pickerReplies,
      [`GET ${ticketPath}`]: json(200, ticket()),
      [`POST ${ticketPath}/service-lines`]: [
        problem(409, 'ticket.patch_test_caution', caution, [{ field: 'acknowledgePatchTest', message: caution }]),
        json(201, withColour({ patchTest: { needed: true, lastPatchTestOn: null, acknowledgedAt: '2026-03-14T15:05:00.000Z' } })),
      ],
    });
    const user = openTicketEditor(frontDeskMe);

    await user.selectOptions(await screen.findByLabelText('Service'), services[0]!.id);
    await user.selectOptions(screen.getByLabelText('Stylist'), wrenId);
    expect(screen.getByText('Senior price 125.00.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Add service' }));

    const alert = await screen.findByRole('alertdialog');
    expect(alert.textContent).toContain('no patch test on record');
    expect(api.calls(`POST ${ticketPath}/service-lines`)).toHaveLength(1);
    expect(JSON.parse(api.calls(`POST ${ticketPath}/service-lines`)[0]!.body).acknowledgePatchTest).toBeUndefined();

    await user.click(within(alert).getByRole('button', { name: 'Go ahead with colour' }));

    const services_ = await screen.findByRole('table', { name: 'Services' });
    expect(within(services_).getByText('Full Colour')).toBeTruthy();
    const resent = api.calls(`POST ${ticketPath}/service-lines`);
    expect(resent).toHaveLength(2);
    expect(JSON.parse(resent[1]!.body)).toEqual({ serviceId: services[0]!.id, staffId: wrenId, acknowledgePatchTest: true });
    expect(screen.getByText('Not current · confirmed')).toBeTruthy();
  });

  it('sends nothing more when the desk decides not to go ahead with colour', async () => {
    const api = fakeApi({
      ...pickerReplies,
      [`GET ${ticketPath}`]: json(200, ticket()),
      [`POST ${ticketPath}/service-lines`]: problem(409, 'ticket.patch_test_caution', 'This client has no patch test on record. Confirm to go ahead.'),
    });
    const user = openTicketEditor(frontDeskMe);
    await user.selectOptions(await screen.findByLabelText('Service'), services[0]!.id);
    await user.selectOptions(screen.getByLabelText('Stylist'), wrenId);
    await user.click(screen.getByRole('button', { name: 'Add service' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Not now' }));

    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(api.calls(`POST ${ticketPath}/service-lines`)).toHaveLength(1);
    expect(screen.queryByRole('table', { name: 'Services' })).toBeNull();
  });

  it('works out the change while cash is typed, and says why the ticket cannot close yet', async () => {
    fakeApi({ ...pickerReplies, [`GET ${ticketPath}`]: json(200, withColour()) });
    const user = openTicketEditor(frontDeskMe);

    await user.click(await screen.findByRole('radio', { name: 'Cash' }));
    const payment = within(screen.getByRole('form', { name: 'Take a payment' }));
    const amount = payment.getByLabelText('Amount');
    expect((amount as HTMLInputElement).value).toBe('125.00');
    await user.clear(amount);
    await user.type(amount, '100');
    await user.type(payment.getByLabelText('Cash handed over'), '120');
    expect(screen.getByText('Change to give: 20.00')).toBeTruthy();
    await user.clear(payment.getByLabelText('Cash handed over'));
    await user.type(payment.getByLabelText('Cash handed over'), '90');
    expect(screen.getByText('That is 10.00 short of the amount.')).toBeTruthy();

    const close = screen.getByRole('button', { name: 'Close ticket' });
    expect(close.hasAttribute('disabled')).toBe(true);
    const why = document.getElementById(close.getAttribute('aria-describedby') ?? '')?.textContent ?? '';
    expect(why).toContain('Full Colour (Wren Halloway) needs a bowl, or a reason why no product was used.');
    expect(why).toContain('125.00 is still due.');
  });

  it('sends a retried card payment with the same key, and a new attempt after a decline with a new one', async () => {
    const paid = withColour({
      serviceLines: [serviceLine({ noProductReason: 'Clear gloss from the client’s own kit' })],
      payments: [{ id: 'p1', method: 'card', kind: 'charge', status: 'succeeded', amount: '125.00', tendered: null, change: null, bookedOn: '2026-03-14', createdAt: '' }],
      totals: { services: '125.00', retail: '0.00', tax: '0.00', tips: '0.00', total: '125.00', paid: '125.00', due: '0.00' },
    });
    const api = fakeApi({
      ...pickerReplies,
      [`GET ${ticketPath}`]: json(200, withColour()),
      [`POST ${ticketPath}/payments`]: [
        problem(409, 'payment.declined', 'The card was declined: insufficient funds.'),
        problem(409, 'payment.declined', 'The card was declined: insufficient funds.'),
        problem(409, 'payment.processor_unavailable', 'The card processor did not answer. The payment is pending: submit the same checkout again to finish it.'),
        json(201, paid),
      ],
    });
    const user = openTicketEditor(frontDeskMe);

    await user.selectOptions(await screen.findByLabelText('Card'), 'Test card — declines');
    const payment = within(screen.getByRole('form', { name: 'Take a payment' }));
    await user.click(screen.getByRole('button', { name: 'Charge 125.00 to card' }));
    expect((await payment.findByRole('alert')).textContent).toContain('declined');
    // The same card once more is a new attempt: a decline is final, so its key is not reused.
    await user.click(screen.getByRole('button', { name: 'Charge 125.00 to card' }));
    await waitFor(() => expect(api.calls(`POST ${ticketPath}/payments`)).toHaveLength(2));

    await user.selectOptions(screen.getByLabelText('Card'), 'Test card — approves');
    await user.click(screen.getByRole('button', { name: 'Charge 125.00 to card' }));
    expect((await payment.findByRole('alert')).textContent).toContain('charged once');
    await user.click(screen.getByRole('button', { name: 'Try again' }));

    await waitFor(() => expect(screen.getByRole('button', { name: 'Close ticket' }).hasAttribute('disabled')).toBe(false));
    const keys = api.calls(`POST ${ticketPath}/payments`).map((call) => JSON.parse(call.body) as { idempotencyKey: string; paymentMethod: string });
    expect(keys.map((k) => k.paymentMethod)).toEqual(['pm_card_chargeDeclined', 'pm_card_chargeDeclined', 'pm_card_visa', 'pm_card_visa']);
    expect(new Set(keys.slice(0, 3).map((k) => k.idempotencyKey)).size).toBe(3);
    expect(keys[3]!.idempotencyKey).toBe(keys[2]!.idempotencyKey);
    expect(keys[2]!.idempotencyKey).toMatch(/^[A-Za-z0-9_-]{8,100}$/);
  });

  it('shows a stylist her lines and bowls, but no checkout, no tips and no bowls on another stylist’s work', async () => {
    const tobyLine = serviceLine({ id: '71000000-0000-4000-8000-000000000002', serviceName: 'Gloss', staffId: tobyId, staffName: 'Toby Quill' });
    fakeApi({ ...pickerReplies, [`GET ${ticketPath}`]: json(200, withColour({ serviceLines: [serviceLine(), tobyLine] })) });
    const user = openTicketEditor(stylistMe);

    const table = await screen.findByRole('table', { name: 'Services' });
    expect(within(table).getAllByRole('button', { name: 'Record a bowl' })).toHaveLength(1);
    expect(screen.queryByRole('heading', { name: 'Checkout' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Close ticket' })).toBeNull();
    expect(screen.queryByRole('form', { name: 'Take a payment' })).toBeNull();
    expect(screen.queryByRole('heading', { name: 'Tips' })).toBeNull();
    expect(screen.queryByRole('button', { name: /^Remove Full Colour/ })).toBeNull();
    expect(screen.getByRole('note', { name: 'Safety with colour' })).toBeTruthy();
    // She adds services only as herself.
    expect((screen.getByLabelText('Stylist') as HTMLSelectElement).disabled).toBe(true);

    await user.click(within(table).getByRole('button', { name: 'Record a bowl' }));
    expect(await screen.findByRole('dialog', { name: /Bowl for Full Colour/ })).toBeTruthy();
  });
});
