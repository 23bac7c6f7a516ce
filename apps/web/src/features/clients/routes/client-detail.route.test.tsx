import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { clientDetail, clientStylistMe, formulaRow, frontDeskMe } from '../client-test-data';
import { openPage } from '../../../test/test-page';
import { ClientDetailRoute, clientDetailLoader } from './client-detail.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.client, loader: clientDetailLoader(queryClient), Component: ClientDetailRoute }];

const client = clientDetail();
const page = (items: ReturnType<typeof formulaRow>[]) => ({ items, total: items.length, limit: 20, offset: 0 });

function clientOnFile(formulas: ReturnType<typeof formulaRow>[], extra: Parameters<typeof fakeApi>[0] = {}) {
  return fakeApi({
    [`GET /api/clients/${client.id}`]: json(200, client),
    [`GET /api/clients/${client.id}/formulas`]: json(200, page(formulas)),
    ...extra,
  });
}

describe('client page', () => {
  it('puts the allergy notes, the patch-test caution and the colour cautions in front of the formulas', async () => {
    clientOnFile([formulaRow(1)]);
    openPage(frontDeskMe, `/clients/${client.id}`, routes);

    expect(await screen.findByRole('heading', { name: 'Sunniva Ostrander' })).toBeTruthy();
    const allergy = screen.getByRole('alert');
    expect(allergy.textContent).toContain('Allergy notes');
    expect(allergy.textContent).toContain('Scalp flared after an ammonia colour in 2025: use the gentle line only.');

    const patch = screen.getByRole('region', { name: 'Patch test' });
    expect(within(patch).getByText('Out of date')).toBeTruthy();
    expect(within(patch).getByRole('note', { name: 'Patch test caution' }).textContent).toBe(client.patchTest.caution);
    expect(within(patch).getByText('180 days')).toBeTruthy();

    const safety = screen.getByRole('note', { name: 'Safety with colour' }).textContent ?? '';
    for (const caution of ['48 hours ahead', 'away from them', 'eyelashes or eyebrows', 'Gloves', 'Ventilation', 'local codes govern']) {
      expect(safety).toContain(caution);
    }
  });

  it('shows no caution when the patch test covers colour, and says when no allergy is noted', async () => {
    fakeApi({
      [`GET /api/clients/${client.id}`]: json(200, {
        ...client,
        allergyNotes: '',
        patchTest: { ...client.patchTest, status: 'current', ageDays: 20, acknowledgementRequired: false, caution: null },
      }),
      [`GET /api/clients/${client.id}/formulas`]: json(200, page([])),
    });
    openPage(frontDeskMe, `/clients/${client.id}`, routes);

    const patch = await screen.findByRole('region', { name: 'Patch test' });
    expect(within(patch).getByText('Covers colour')).toBeTruthy();
    expect(within(patch).queryByRole('note')).toBeNull();
    expect(screen.getByText('No allergies or sensitivities noted.')).toBeTruthy();
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByText('No bowls yet')).toBeTruthy();
  });

  it('lists every bowl with its mix, and no cost column when the server sends no costs', async () => {
    clientOnFile([formulaRow(1), formulaRow(2, { processingMinutes: null, note: '', mixedByName: 'Tamsin Orrell' })]);
    openPage(clientStylistMe, `/clients/${client.id}`, routes);

    const table = await screen.findByRole('table', { name: 'Formula history' });
    const headings = within(table)
      .getAllByRole('columnheader')
      .map((h) => h.textContent);
    expect(headings).not.toContain('Product cost');
    const [, first, second] = within(table).getAllByRole('row') as HTMLElement[];
    expect(within(first as HTMLElement).getByText('1 : 1.50')).toBeTruthy();
    expect(within(first as HTMLElement).getByText('45 g')).toBeTruthy();
    expect(within(first as HTMLElement).getByText('20 vol')).toBeTruthy();
    expect(within(first as HTMLElement).getByText('35 min')).toBeTruthy();
    expect(within(first as HTMLElement).getByText('6.5 g')).toBeTruthy();
    expect(within(first as HTMLElement).getByText('Back sections first.')).toBeTruthy();
    expect(within(second as HTMLElement).getByText('Jorunn Aldersey, mixed by Tamsin Orrell')).toBeTruthy();
    // A stylist reads the record but does not change it.
    expect(screen.queryByRole('button', { name: 'Edit client' })).toBeNull();
  });

  it('adds the cost column when the server sends bowl costs', async () => {
    clientOnFile([formulaRow(1, { cost: '4.12' })]);
    openPage(frontDeskMe, `/clients/${client.id}`, routes);

    const table = await screen.findByRole('table', { name: 'Formula history' });
    expect(within(table).getByRole('columnheader', { name: 'Product cost' })).toBeTruthy();
    expect(within(table).getByRole('cell', { name: '4.12' })).toBeTruthy();
  });

  it('records a new patch-test date and shows the server’s refusal under that field', async () => {
    const api = clientOnFile([], {
      [`PATCH /api/clients/${client.id}`]: problem(400, 'client.patch_test_in_future', 'The patch test date is after today.', [
        { field: 'lastPatchTestOn', message: 'The patch test date is after today.' },
      ]),
    });
    const { user } = openPage(frontDeskMe, `/clients/${client.id}`, routes);

    await user.click(await screen.findByRole('button', { name: 'Edit client' }));
    const date = screen.getByLabelText('Last patch test');
    await user.clear(date);
    await user.type(date, '2030-01-02');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(date.getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByText('The patch test date is after today.')).toBeTruthy();
    expect(JSON.parse(api.calls(`PATCH /api/clients/${client.id}`)[0]?.body ?? '')).toEqual({ lastPatchTestOn: '2030-01-02' });
  });
});
