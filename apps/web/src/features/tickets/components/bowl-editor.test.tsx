import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { createQueryClient } from '../../../lib/query-client';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { BowlEditor } from './bowl-editor';
import { products, serviceLine, staff, ticket, ticketId } from './ticket-test-kit';

function renderEditor() {
  const onClose = vi.fn();
  render(
    <QueryClientProvider client={createQueryClient()}>
      <BlueprintProvider>
        <BowlEditor isOpen ticketId={ticketId} line={serviceLine()} products={products} staff={staff} patchTestNote="No patch test is on record." onClose={onClose} />
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  return { onClose, user: userEvent.setup() };
}

/** The figure beside a label in the "As mixed" list. */
function figure(label: string): string {
  const figures = screen.getByRole('region', { name: 'Bowl figures' });
  const term = within(figures).getByText(label, { selector: 'dt' });
  return term.nextElementSibling?.textContent ?? '';
}

describe('BowlEditor', () => {
  it('shows the bowl’s figures while it is typed: ounces to grams, ratio, developer strength and cost', async () => {
    const { user } = renderEditor();

    await user.selectOptions(screen.getByLabelText('Product 1'), 'Fernhollow Crème 6 Walnut');
    await user.type(screen.getByLabelText('Amount 1'), '2');
    await user.selectOptions(screen.getByLabelText('Unit 1'), 'oz');
    await user.selectOptions(screen.getByLabelText('Product 2'), 'Fernhollow Developer 20 vol');
    await user.type(screen.getByLabelText('Amount 2'), '56.7');

    // 2 oz = 56.69904625 g, recorded to the milligram (NIST Handbook 44: 1 oz = 28.349523125 g).
    expect(screen.getByLabelText('Grams 1').textContent).toBe('56.699 g');
    expect(figure('Total')).toBe('113.399 g');
    expect(figure('Ratio')).toBe('1 : 1.00');
    // 20 volume is 6 % hydrogen peroxide (common practice in the trade: 10 vol = 3 %).
    expect(figure('Strength')).toBe('20 vol (6 %)');
    // 56.699 g × 0.141096 + 56.7 g × 0.011914 = 8.675525904 → 8.68.
    expect(figure('Product cost')).toBe('8.68');
    expect(figure('Waste')).toBe('0 g · 0.00');

    await user.type(screen.getByLabelText('Leftover (g)'), '10');
    // Waste is costed at the mix's average cost per gram: 8.675525904 × 10 / 113.399 = 0.765… → 0.77.
    expect(figure('Waste')).toBe('10 g · 0.77');
  });

  it('keeps the safety cautions beside the bowl', () => {
    renderEditor();
    const safety = screen.getByRole('note', { name: 'Safety with colour' });
    expect(safety.textContent).toContain('48 hours');
    expect(safety.textContent).toContain('No patch test is on record.');
    expect(safety.textContent).toMatch(/eyelashes or eyebrows/);
    expect(safety.textContent).toContain('Gloves');
    expect(safety.textContent).toContain('Ventilation');
    expect(safety.textContent).toContain('local codes govern');
  });

  it('says when the leftover is more than was mixed, and sends nothing', async () => {
    const api = fakeApi({});
    const { user } = renderEditor();
    await user.selectOptions(screen.getByLabelText('Product 1'), 'Fernhollow Crème 6 Walnut');
    await user.type(screen.getByLabelText('Amount 1'), '30');
    await user.type(screen.getByLabelText('Leftover (g)'), '31');

    expect(screen.getByText('The leftover cannot be more than the 30 g mixed.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Record bowl' }));
    expect(api.seen).toHaveLength(0);
  });

  it('records the bowl as weighed and puts the server’s problem on the row it names', async () => {
    const api = fakeApi({
      'POST /api/tickets/70000000-0000-4000-8000-000000000001/bowls': [
        problem(400, 'request.invalid', 'Check these fields.', [{ field: 'components[1].amount', message: 'amount must be more than 0' }]),
        json(201, ticket()),
      ],
    });
    const { user, onClose } = renderEditor();
    await user.selectOptions(screen.getByLabelText('Product 1'), 'Fernhollow Crème 6 Walnut');
    await user.type(screen.getByLabelText('Amount 1'), '2');
    await user.selectOptions(screen.getByLabelText('Unit 1'), 'oz');
    await user.selectOptions(screen.getByLabelText('Product 2'), 'Fernhollow Developer 20 vol');
    await user.type(screen.getByLabelText('Amount 2'), '0');
    await user.type(screen.getByLabelText('Processing (min)'), '35');
    await user.click(screen.getByRole('button', { name: 'Record bowl' }));

    expect(await screen.findByText('Product 2: amount must be more than 0')).toBeTruthy();
    expect(screen.getByLabelText('Amount 2').getAttribute('aria-invalid')).toBe('true');
    expect(onClose).not.toHaveBeenCalled();

    await user.clear(screen.getByLabelText('Amount 2'));
    await user.type(screen.getByLabelText('Amount 2'), '56.7');
    await user.click(screen.getByRole('button', { name: 'Record bowl' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    const sent = api.calls('POST /api/tickets/70000000-0000-4000-8000-000000000001/bowls').map((call) => JSON.parse(call.body));
    expect(sent[1]).toEqual({
      serviceLineId: serviceLine().id,
      mixedByStaffId: serviceLine().staffId,
      components: [
        { productId: products[0]!.id, amount: '2', unit: 'oz' },
        { productId: products[1]!.id, amount: '56.7', unit: 'g' },
      ],
      processingMinutes: 35,
    });
  });
});
