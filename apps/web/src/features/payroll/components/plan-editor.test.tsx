import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { openPage } from '../../../test/test-page';
import { PayPlansRoute, payPlansLoader } from '../routes/pay-plans.route';
import { calendar, planAccountantMe, planOwnerMe, planStaff, standardPlan, unscheduled } from './plan-test-data';

const routes = (queryClient: QueryClient) => [{ path: routePaths.payrollPlans, loader: payPlansLoader(queryClient), Component: PayPlansRoute }];

const api = (overrides: Parameters<typeof fakeApi>[0] = {}) =>
  fakeApi({
    'GET /api/payroll/plans': json(200, [standardPlan]),
    'GET /api/payroll/periods': json(200, calendar),
    'GET /api/staff': json(200, planStaff),
    ...overrides,
  });

const money = (value: Decimal) => value.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2);
const grouped = (text: string) => text.replace(/\B(?=(\d{3})+(?!\d))/, ',');

/** The preview's table: the commission of each tier row, and the total. */
function previewFigures() {
  const table = screen.getByRole('table', { name: 'Commission on the sample' });
  const rows = within(table).getAllByRole('row');
  const tierRows = rows.filter((row) => /–|and over/.test(within(row).queryAllByRole('rowheader')[0]?.textContent ?? ''));
  const total = rows.find((row) => within(row).queryByRole('rowheader', { name: 'Total commission' }));
  return {
    tiers: tierRows.map((row) => within(row).getAllByRole('cell').at(-1)?.textContent),
    total: total ? within(total).getByRole('cell').textContent : null,
  };
}

describe('pay plan editor', () => {
  it('recomputes the preview on every keystroke in a tier', async () => {
    api();
    const { user } = openPage(planOwnerMe, routePaths.payrollPlans, routes);
    await user.click(await screen.findByRole('button', { name: 'Change terms for Standard' }));

    // The sample (service 6,000 of which colour 2,500 over 10 services, colour product 300, retail 400), recomputed
    // with decimal.js: charge 300 × 1.10; bands of 1,500 at 35 % and 40 %, the rest at 45 %; retail 400 × 10 %.
    const net = new Decimal(6000).minus(new Decimal(300).times('1.1'));
    const third = money(net.minus(3000).times('0.45'));
    const retail = new Decimal(400).times('0.1');
    const before = [money(new Decimal(1500).times('0.35')), money(new Decimal(1500).times('0.40')), third];
    expect(previewFigures().tiers).toEqual(before.map(grouped));
    expect(previewFigures().total).toBe(grouped(money(before.reduce((t, c) => t.plus(c), retail))));

    const rate = screen.getByRole('textbox', { name: 'Tier 2 rate %' });
    await user.clear(rate);
    expect(screen.getByText('The preview appears once every tier has its revenue and rate.')).toBeTruthy();
    await user.type(rate, '5');
    expect(previewFigures().tiers[1]).toBe(money(new Decimal(1500).times('0.05')));
    await user.type(rate, '0');
    const after = [before[0]!, money(new Decimal(1500).times('0.50')), third];
    expect(previewFigures().tiers).toEqual(after.map(grouped));
    expect(previewFigures().total).toBe(grouped(money(after.reduce((t, c) => t.plus(c), retail))));

    // A threshold below the one before it is refused by the pay rules themselves, beside the field.
    const from = screen.getByRole('textbox', { name: 'Tier 3 from period revenue' });
    await user.clear(from);
    await user.type(from, '1000');
    expect(from.getAttribute('aria-invalid')).toBe('true');
    expect(document.getElementById(from.getAttribute('aria-describedby') ?? '')?.textContent).toMatch(/greater than the tier before it/);
  });

  it('sends rates as fractions and shows the API’s field errors beside their fields', async () => {
    const fake = api({
      'POST /api/payroll/plans': [
        problem(409, 'pay_plan.name_taken', 'A pay plan called "Standard" already exists.', [{ field: 'name', message: 'A pay plan called "Standard" already exists.' }]),
        problem(400, 'pay_plan.invalid', 'terms.tiers[1].from must be greater than the tier before it (0)', [
          { field: 'terms.tiers[1].from', message: 'terms.tiers[1].from must be greater than the tier before it (0)' },
        ]),
      ],
    });
    const { user } = openPage(planOwnerMe, routePaths.payrollPlans, routes);
    await user.click(await screen.findByRole('button', { name: 'New plan' }));

    await user.type(screen.getByLabelText('Name'), 'Standard');
    await user.click(screen.getByRole('button', { name: 'Add tier' }));
    // The new tier takes the cursor.
    expect(document.activeElement).toBe(screen.getByRole('textbox', { name: 'Tier 2 from period revenue' }));
    await user.keyboard('2500');
    await user.type(screen.getByRole('textbox', { name: 'Tier 2 rate %' }), '42.5');
    await user.selectOptions(screen.getByLabelText('Colour product charge'), 'Share of the service price');
    await user.type(screen.getByLabelText('Share of the price'), '8');
    await user.click(screen.getByRole('button', { name: 'Create plan' }));

    await waitFor(() => expect(fake.calls('POST /api/payroll/plans')).toHaveLength(1));
    expect(JSON.parse(fake.calls('POST /api/payroll/plans')[0]?.body ?? '')).toEqual({
      name: 'Standard',
      terms: {
        effectiveFrom: '2026-03-02',
        tierMode: 'marginal',
        tiers: [
          { from: '0', rate: '0.4' },
          { from: '2500', rate: '0.425' },
        ],
        productCharge: { mode: 'percent-of-price', value: '0.08' },
        retailRate: '0.1',
      },
    });
    const name = screen.getByLabelText('Name');
    await waitFor(() => expect(name.getAttribute('aria-invalid')).toBe('true'));
    expect(document.activeElement).toBe(name);
    expect(document.getElementById(name.getAttribute('aria-describedby') ?? '')?.textContent).toBe('A pay plan called "Standard" already exists.');

    await user.type(name, ' team');
    expect(name.getAttribute('aria-invalid')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Create plan' }));
    const from = screen.getByRole('textbox', { name: 'Tier 2 from period revenue' });
    await waitFor(() => expect(from.getAttribute('aria-invalid')).toBe('true'));
    expect(document.getElementById(from.getAttribute('aria-describedby') ?? '')?.textContent).toBe(
      'The starting revenue must be greater than the tier before it (0)',
    );
  });

  it('offers only periods after the last approved payroll, and says why', async () => {
    api();
    const { user } = openPage(planOwnerMe, routePaths.payrollPlans, routes);
    await user.click(await screen.findByRole('button', { name: 'Change terms for Standard' }));
    const start = screen.getByLabelText('Takes effect from');
    const options = within(start).getAllByRole('option').map((o) => (o as HTMLOptionElement).value);
    expect(options).toEqual(['2026-03-02', '2026-03-16']);
    expect((start as HTMLSelectElement).value).toBe('2026-03-16');
    expect(screen.getByText(/Payroll runs already approved keep the figures they were approved with and never change/)).toBeTruthy();
  });

  it('lists each plan’s terms on one line with who is on it, and gives the owner the edit controls', async () => {
    api();
    openPage(planOwnerMe, routePaths.payrollPlans, routes);
    const table = await screen.findByRole('table', { name: 'Pay plans' });
    expect(within(table).getByText(/Band by band: 35\s%, 40\s% from 1,500\.00, 45\s% from 3,000\.00 · colour product at cost \+ 10\s% · retail 10\s%/)).toBeTruthy();
    expect(within(table).getByText(/^Jorunn Aldersey/)).toBeTruthy();
    expect(within(table).getByText(/Joins .*Mar 16, 2026: Tamsin Okonkwo-Reyes/)).toBeTruthy();
    expect(screen.getByText(/Bartholomew Quill, Tamsin Okonkwo-Reyes \(Standard from .*Mar 16, 2026\)\. Their service and retail sales earn no commission/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'New plan' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Put staff on Standard' })).toBeTruthy();
  });

  it('shows the accountant the terms read-only', async () => {
    api();
    const { user } = openPage(planAccountantMe, routePaths.payrollPlans, routes);
    await screen.findByRole('table', { name: 'Pay plans' });
    expect(screen.queryByRole('button', { name: 'New plan' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Change terms for Standard' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Set schedule|Save schedule/ })).toBeNull();

    await user.click(screen.getByRole('button', { name: 'Terms of Standard' }));
    const tiers = screen.getByRole('table', { name: 'Commission tiers' });
    expect(within(tiers).queryAllByRole('textbox')).toHaveLength(0);
    expect(within(tiers).getByText('40 %')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Save new terms' })).toBeNull();
    expect(screen.getByText('Only the owner changes pay plans.', { exact: false })).toBeTruthy();
    // The sample stays live for her: the preview is not a change to the plan.
    expect(previewFigures().total).not.toBeNull();
    expect(screen.getByText(/to be confirmed by a payroll professional/)).toBeTruthy();
  });

  it('with no plans yet, offers to create the first', async () => {
    api({ 'GET /api/payroll/plans': json(200, []) });
    const { user } = openPage(planOwnerMe, routePaths.payrollPlans, routes);
    expect(await screen.findByText('No pay plans yet')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Create the first plan' }));
    expect(screen.getByRole('dialog', { name: 'New pay plan' })).toBeTruthy();
  });

  it('sets the pay schedule, and shows the API’s refusal once periods exist', async () => {
    const fake = api({
      'GET /api/payroll/plans': json(200, []),
      'GET /api/payroll/periods': json(200, unscheduled),
      'PUT /api/payroll/schedule': problem(409, 'pay_schedule.in_use', 'Pay periods already exist; the schedule can no longer change.'),
    });
    const { user } = openPage(planOwnerMe, routePaths.payrollPlans, routes);
    expect(await screen.findByText(/Set the pay schedule first/)).toBeTruthy();
    expect((screen.getByRole('button', { name: 'Create the first plan' }) as HTMLButtonElement).disabled).toBe(true);

    await user.selectOptions(screen.getByLabelText('Paid'), 'Every week');
    await user.type(screen.getByLabelText('A period starts on'), '2026-03-02');
    await user.selectOptions(screen.getByLabelText('Workweeks start on'), 'Monday');
    await user.click(screen.getByRole('button', { name: 'Set schedule' }));

    await waitFor(() => expect(fake.calls('PUT /api/payroll/schedule')).toHaveLength(1));
    expect(JSON.parse(fake.calls('PUT /api/payroll/schedule')[0]?.body ?? '')).toEqual({ frequency: 'weekly', anchorDate: '2026-03-02', workweekStartsOn: 1 });
    expect((await screen.findByRole('alert')).textContent).toBe('Pay periods already exist; the schedule can no longer change.');
  });

  it('puts the ticked staff on a plan from the chosen period, one request each', async () => {
    const fake = api({ 'POST /api/payroll/plans/9a9e0000-0000-4000-8000-000000000001/assignments': json(201, standardPlan) });
    const { user } = openPage(planOwnerMe, routePaths.payrollPlans, routes);
    await user.click(await screen.findByRole('button', { name: 'Put staff on Standard' }));
    const dialog = screen.getByRole('dialog', { name: 'Put staff on Standard' });
    expect(within(dialog).getByRole('checkbox', { name: /Tamsin Okonkwo-Reyes — on no plan: earns no commission; then Standard from .*Mar 16, 2026/ })).toBeTruthy();
    await user.click(within(dialog).getByRole('checkbox', { name: /Bartholomew Quill/ }));
    await user.click(within(dialog).getByRole('checkbox', { name: /Tamsin Okonkwo-Reyes/ }));
    await user.selectOptions(within(dialog).getByLabelText('From the pay period'), '2026-03-16');
    await user.click(within(dialog).getByRole('button', { name: 'Put 2 on Standard' }));

    const key = 'POST /api/payroll/plans/9a9e0000-0000-4000-8000-000000000001/assignments';
    await waitFor(() => expect(fake.calls(key)).toHaveLength(2));
    expect(fake.calls(key).map((c) => JSON.parse(c.body))).toEqual([
      { staffId: planStaff[2]!.id, effectiveFrom: '2026-03-16' },
      { staffId: planStaff[1]!.id, effectiveFrom: '2026-03-16' },
    ]);
  });
});
