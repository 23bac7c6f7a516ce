import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import { addDays, format, parseISO, startOfMonth, subMonths } from 'date-fns';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { businessDateIn } from '../../../lib/business-date';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json } from '../../../test/fake-api';
import { openPage } from '../../../test/test-page';
import { comparison, compareDeskMe, compareOwnerMe, definitions, elmstead, elmsteadDays, elmsteadStylists, feeStatements, trend } from '../compare-test-data';
import { CompareBranchRoute, compareBranchLoader } from './compare-branch.route';
import { CompareFeesRoute, compareFeesLoader } from './compare-fees.route';
import { CompareRoute, compareLoader } from './compare.route';

const routes = (queryClient: QueryClient) => [
  { path: routePaths.compare, loader: compareLoader(queryClient), Component: CompareRoute },
  { path: routePaths.compareBranch, loader: compareBranchLoader(queryClient), Component: CompareBranchRoute },
  { path: routePaths.compareFees, loader: compareFeesLoader(queryClient), Component: CompareFeesRoute },
];

const today = businessDateIn(elmstead.timeZone);
const definitionOf = (figure: string) => definitions.figures.find((f) => f.figure === figure)?.definition ?? '';
const ymd = (date: Date) => format(date, 'yyyy-MM-dd');

/** The API answering every range it is asked for, and the query strings it was asked with. */
function compareApi(schedule: { frequency: 'weekly' | 'biweekly' | 'semi-monthly'; anchorDate: string; workweekStartsOn: number } | null = null) {
  const asked: URLSearchParams[] = [];
  const answer = (build: (from: string, to: string) => unknown) => (request: Request) => {
    const query = new URL(request.url).searchParams;
    asked.push(query);
    return json(200, build(query.get('from') ?? '', query.get('to') ?? ''));
  };
  const api = fakeApi({
    'GET /api/compare/branches': answer(comparison),
    'GET /api/compare/trend': answer(trend),
    [`GET /api/compare/branches/${elmstead.id}/days`]: answer(elmsteadDays),
    [`GET /api/compare/branches/${elmstead.id}/stylists`]: answer(elmsteadStylists),
    'GET /api/compare/definitions': json(200, definitions),
    'GET /api/payroll/periods': json(200, { schedule, current: null, next: null, periods: [] }),
  });
  return { api, asked };
}

/** Branch names down the table, top to bottom, as the owner reads them. */
async function branchOrder(): Promise<string[]> {
  const table = await screen.findByRole('region', { name: 'Branch figures' });
  const names = [...table.querySelectorAll('.tr-compare-name')].map((cell) => cell.textContent ?? '');
  return [...new Set(names)];
}

beforeAll(async () => {
  await import('./compare.route');
}, 60_000);

// happy-dom lays nothing out, and Table2 draws only the columns that fit the viewport it measures:
// give every element a wide screen's size so all the columns are drawn, as in a browser.
const measured = ['clientWidth', 'clientHeight'] as const;
const layout = measured.map((name) => [name, Object.getOwnPropertyDescriptor(HTMLElement.prototype, name)] as const);
beforeAll(() => {
  Object.defineProperty(HTMLElement.prototype, 'clientWidth', { configurable: true, get: () => 4000 });
  Object.defineProperty(HTMLElement.prototype, 'clientHeight', { configurable: true, get: () => 800 });
});
afterAll(() => {
  for (const [name, descriptor] of layout) if (descriptor) Object.defineProperty(HTMLElement.prototype, name, descriptor);
});

describe('Compare branches', () => {
  it('shows a row per branch and the totals row last, with figures formatted for reading', async () => {
    compareApi();
    openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29&rebookingDays=42', routes);

    expect(await branchOrder()).toEqual(['Elmstead', 'Larkspur Row', 'Quarry Lane', 'All branches']);
    const table = screen.getByRole('region', { name: 'Branch figures' });
    // Money grouped by thousands, fractions as percentages, counts as they are.
    expect(within(table).getAllByText('36,900.00').length).toBeGreaterThan(0);
    expect(within(table).getAllByText('13.7 %').length).toBeGreaterThan(0);
    expect(within(table).getAllByText('470').length).toBeGreaterThan(0);
    expect(screen.getByText(/Sep 1 – Nov 29, 2026 · 90 days/)).toBeTruthy();
  });

  it('sorts by a column, highest first then lowest first, keeping the totals row last', async () => {
    compareApi();
    const { user } = openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29', routes);
    await branchOrder();

    await user.selectOptions(screen.getByLabelText('Sort by'), 'Average ticket');
    expect(await branchOrder()).toEqual(['Larkspur Row', 'Elmstead', 'Quarry Lane', 'All branches']);
    expect(screen.getByText('Sorted by Average ticket, highest first.')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Order: highest first. Reverse it' }));
    expect(await branchOrder()).toEqual(['Quarry Lane', 'Elmstead', 'Larkspur Row', 'All branches']);

    // A branch without the figure goes last whichever way: Quarry Lane has no colour revenue.
    await user.selectOptions(screen.getByLabelText('Sort by'), 'Colour cost share');
    expect(await branchOrder()).toEqual(['Larkspur Row', 'Elmstead', 'Quarry Lane', 'All branches']);
    await user.click(screen.getByRole('button', { name: 'Order: highest first. Reverse it' }));
    expect(await branchOrder()).toEqual(['Elmstead', 'Larkspur Row', 'Quarry Lane', 'All branches']);
  });

  it('sorts by a column when its header is clicked, and reverses on a second click', async () => {
    compareApi();
    const { user } = openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29', routes);
    await branchOrder();
    const header = (label: string) => within(screen.getByRole('region', { name: 'Branch figures' })).getAllByText(label)[0]?.closest('button') as HTMLElement;

    await user.click(header('Tickets'));
    expect(await branchOrder()).toEqual(['Larkspur Row', 'Elmstead', 'Quarry Lane', 'All branches']);
    await user.click(header('Tickets'));
    expect(await branchOrder()).toEqual(['Quarry Lane', 'Elmstead', 'Larkspur Row', 'All branches']);
    expect((screen.getByLabelText('Sort by') as HTMLSelectElement).value).toBe('tickets');
  });

  it('explains every missing figure in words', async () => {
    compareApi();
    openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29', routes);
    await branchOrder();

    const table = screen.getByRole('region', { name: 'Branch figures' });
    const dash = within(table).getAllByText('—')[0] as HTMLElement;
    expect(dash.closest('[title]')?.getAttribute('title')).toMatch(/^(Quarry Lane|Elmstead|Larkspur Row|All branches): /);
    const notes = within(screen.getByRole('list', { name: 'Why some figures are missing' }))
      .getAllByRole('listitem')
      .map((item) => item.textContent);
    expect(notes).toContain('Colour cost share for Quarry Lane: no colour service revenue.');
    expect(notes).toContain('Commission cost for Larkspur Row, Quarry Lane: no approved payroll run covers these dates.');
  });

  it('shows the API’s definition of a figure on its column header and in the list of definitions', async () => {
    compareApi();
    const { user } = openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29', routes);
    await branchOrder();
    const header = within(screen.getByRole('region', { name: 'Branch figures' })).getAllByText('Average ticket')[0] as HTMLElement;
    await user.hover(header);
    expect(await screen.findByText(definitionOf('averageTicket'))).toBeTruthy();
    await user.unhover(header);

    await user.click(screen.getByRole('button', { name: 'What the figures mean' }));
    const list = document.getElementById('compare-definitions') as HTMLElement;
    expect(within(list).getByText('Colour cost share').nextElementSibling?.textContent).toBe(definitionOf('colourCostShare'));
    // The API's heading wins over the app's own.
    expect(within(list).getByText('Money refunded')).toBeTruthy();
    expect(within(screen.getByRole('region', { name: 'Branch figures' })).getAllByText('Money refunded').length).toBeGreaterThan(0);
  });

  it('moves the range to a preset and keeps it in the address', async () => {
    const { asked } = compareApi();
    const { user, router } = openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29&rebookingDays=30', routes);
    await branchOrder();

    await user.click(screen.getByRole('button', { name: 'Month to date' }));

    // date-fns, an independent date library, says where the month began.
    const monthStart = ymd(startOfMonth(parseISO(today)));
    await waitFor(() => expect(router.state.location.search).toBe(`?from=${monthStart}&to=${today}&rebookingDays=30`));
    await waitFor(() => expect(asked.some((q) => q.get('from') === monthStart && q.get('to') === today && q.get('rebookingDays') === '30')).toBe(true));
    await waitFor(() => expect(screen.getByRole('button', { name: 'Month to date' }).getAttribute('aria-pressed')).toBe('true'));
    expect((screen.getByLabelText('From') as HTMLInputElement).value).toBe(monthStart);

    await user.click(screen.getByRole('button', { name: 'Last 90 days' }));
    await waitFor(() => expect(router.state.location.search).toBe(`?from=${ymd(addDays(parseISO(today), -89))}&to=${today}&rebookingDays=30`));

    // Without a pay schedule there is no last pay period to offer.
    expect(screen.getByRole('button', { name: 'Last pay period' }).hasAttribute('disabled')).toBe(true);
    expect(screen.getByText('Last pay period: no pay schedule is set yet.')).toBeTruthy();
  });

  it('takes the last pay period from the pay calendar', async () => {
    const anchorDate = ymd(addDays(parseISO(today), -40));
    compareApi({ frequency: 'biweekly', anchorDate, workweekStartsOn: 0 });
    const { user, router } = openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29', routes);
    await branchOrder();
    const lastPeriod = screen.getByRole('button', { name: 'Last pay period' });
    await waitFor(() => expect(lastPeriod.hasAttribute('disabled')).toBe(false));

    await user.click(lastPeriod);

    // date-fns walks fortnights from the anchor to the one holding today; the one before it is wanted.
    let start = parseISO(anchorDate);
    while (addDays(start, 14) <= parseISO(today)) start = addDays(start, 14);
    const from = ymd(addDays(start, -14));
    const to = ymd(addDays(start, -1));
    await waitFor(() => expect(router.state.location.search).toBe(`?from=${from}&to=${to}&rebookingDays=42`));
    await waitFor(() => expect(lastPeriod.getAttribute('aria-pressed')).toBe('true'));
    // Fourteen days are drawn day by day.
    expect(await screen.findByRole('heading', { name: 'Revenue per day' })).toBeTruthy();
  });

  it('takes exact dates, refusing a first day after the last', async () => {
    compareApi();
    const { user, router } = openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-11-29', routes);
    await branchOrder();

    const from = screen.getByLabelText('From');
    await user.clear(from);
    await user.type(from, '2026-12-01');
    expect(screen.getByRole('alert').textContent).toBe('Choose a first day on or before the last day.');
    expect(screen.getByRole('button', { name: 'Show' }).hasAttribute('disabled')).toBe(true);

    await user.clear(from);
    await user.type(from, '2026-10-01{Enter}');
    await waitFor(() => expect(router.state.location.search).toBe('?from=2026-10-01&to=2026-11-29&rebookingDays=42'));
  });

  it('drills into a branch with the same range: its days, its stylists and its trend', async () => {
    compareApi();
    const { user, router } = openPage(compareOwnerMe, '/compare?from=2026-09-01&to=2026-09-30', routes);
    await branchOrder();

    await user.click(screen.getAllByRole('link', { name: 'Elmstead: days and stylists' })[0] as HTMLElement);

    await screen.findByRole('heading', { name: 'Elmstead', level: 1 });
    expect(router.state.location.pathname).toBe(`/compare/branches/${elmstead.id}`);
    expect(router.state.location.search).toBe('?from=2026-09-01&to=2026-09-30&rebookingDays=42');
    const days = within(screen.getByRole('table', { name: 'Days' }));
    expect(days.getAllByRole('row')).toHaveLength(3);
    expect(days.getByRole('rowheader', { name: /Sep 1, 2026$/ })).toBeTruthy();
    // A day the manager has not closed yet says so: its figures can still change.
    expect(days.getByRole('rowheader', { name: /Sep 30, 2026 not closed yet$/ })).toBeTruthy();
    const stylists = within(screen.getByRole('table', { name: 'Stylists' }));
    expect(stylists.getByRole('rowheader', { name: 'Wren Halloway' })).toBeTruthy();
    expect(stylists.getByText('6,240.00')).toBeTruthy();
    // Only this branch's line, summed per day from services and retail.
    expect(screen.getByText(/Elmstead: 1,000.00 in all, best day Sep 30, 2026 with 540.00./)).toBeTruthy();
    expect(screen.queryByText(/Quarry Lane:/)).toBeNull();

    await user.click(screen.getByRole('link', { name: /All branches/ }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/compare'));
    expect(router.state.location.search).toBe('?from=2026-09-01&to=2026-09-30&rebookingDays=42');
  });

  it('turns away a person who may not compare branches', async () => {
    compareApi();
    openPage(compareDeskMe, '/compare', routes);
    expect((await screen.findByRole('alert')).textContent).toBe('Comparing branches is for the owner, the accountant and branch managers.');
  });
});

describe('Franchise fees', () => {
  it('shows each branch’s base, rates and amounts for the chosen month', async () => {
    const months: string[] = [];
    fakeApi({
      'GET /api/compare/definitions': json(200, definitions),
      'GET /api/compare/fees': (request) => {
        const month = new URL(request.url).searchParams.get('month') ?? '';
        months.push(month);
        return json(200, feeStatements(month));
      },
    });
    const lastMonth = subMonths(parseISO(today), 1);
    const monthBefore = subMonths(parseISO(today), 2);
    const { user, router } = openPage(compareOwnerMe, '/compare/fees', routes);

    // With no month asked for, last month's statements (date-fns says which month that is).
    const quarry = within(await screen.findByRole('table', { name: `Fees of Quarry Lane, ${format(lastMonth, 'MMMM yyyy')}` }));
    const cells = (name: string) => quarry.getByRole('rowheader', { name }).parentElement?.textContent;
    expect(cells('Gross sales')).toBe('Gross salesbase9,530.55');
    expect(cells('Royalty')).toBe('Royalty5.5 %524.18');
    expect(cells('Marketing fund')).toBe('Marketing fund1.5 %142.96');
    expect(cells('Total fees')).toBe('Total fees667.14');
    const all = within(screen.getByRole('table', { name: `Fees of All branches, ${format(lastMonth, 'MMMM yyyy')}` }));
    expect(all.getByRole('rowheader', { name: 'Royalty' }).parentElement?.textContent).toBe('Royalty—1,385.30');
    expect(all.getByRole('rowheader', { name: 'Total fees' }).parentElement?.textContent).toBe('Total fees1,815.30');
    expect(screen.getByText('These fees follow the rates on each branch; the franchise agreement governs.')).toBeTruthy();

    await user.selectOptions(screen.getByLabelText('Month'), format(monthBefore, 'yyyy-MM'));
    await screen.findByRole('table', { name: `Fees of Quarry Lane, ${format(monthBefore, 'MMMM yyyy')}` });
    expect(router.state.location.search).toBe(`?month=${format(monthBefore, 'yyyy-MM')}`);
    expect(months).toEqual([format(lastMonth, 'yyyy-MM'), format(monthBefore, 'yyyy-MM')]);
  });
});
