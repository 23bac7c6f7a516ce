import type { QueryClient } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { routePaths } from '../../../lib/route-paths';
import { fakeApi, json, problem } from '../../../test/fake-api';
import { badPreview, catalogueDeskMe, catalogueOwnerMe, goodPreview, levels, products, services } from '../catalogue-test-data';
import { openPage } from '../../../test/test-page';
import { CatalogueRoute, catalogueLoader } from './catalogue.route';

const routes = (queryClient: QueryClient) => [{ path: routePaths.catalogue, loader: catalogueLoader(queryClient), Component: CatalogueRoute }];

const catalogue = { 'GET /api/catalogue/levels': json(200, levels), 'GET /api/catalogue/services': json(200, services), 'GET /api/catalogue/products': json(200, products) };

const csv = (name: string, text: string) => new File([text], name, { type: 'text/csv' });

describe('Menu & products', () => {
  it('previews an upload with its row errors, refuses to save it, then saves a clean file', async () => {
    const sent: { commit: string | null; body: string }[] = [];
    const api = fakeApi({
      ...catalogue,
      'POST /api/catalogue/products/import': (request) => {
        const commit = new URL(request.url).searchParams.get('commit');
        const body = api.seen.at(-1)?.body ?? '';
        sent.push({ commit, body });
        if (commit === 'true') return json(200, { ...goodPreview, committed: true });
        return json(200, body.includes('Too Strong Developer') ? badPreview : goodPreview);
      },
    });
    const { user } = openPage(catalogueOwnerMe, '/menu-and-products?show=products', routes);

    await user.click(await screen.findByRole('button', { name: 'Upload a spreadsheet' }));
    const dialog = screen.getByRole('dialog', { name: 'Upload products' });
    expect(within(dialog).getByRole('table', { name: 'Columns' }).textContent).toContain('container_cost');
    const saveAll = within(dialog).getByRole('button', { name: 'Save all' });
    expect(saveAll.hasAttribute('disabled')).toBe(true);

    await user.upload(within(dialog).getByLabelText('Spreadsheet of products'), csv('bad.csv', 'code,name\nBRK-DV-55,Too Strong Developer\n'));
    const preview = await within(dialog).findByRole('table', { name: 'Preview of the products' });
    const [, good, bad] = within(preview).getAllByRole('row') as HTMLElement[];
    expect(within(good as HTMLElement).getByText('Adds')).toBeTruthy();
    expect(within(bad as HTMLElement).getByText('2 errors')).toBeTruthy();
    const badCell = within(bad as HTMLElement).getByText('container_size must be a number such as 60').closest('td');
    expect(badCell?.textContent).toContain('abc');
    expect(badCell?.getAttribute('aria-invalid')).toBe('true');
    // An error on a column the file does not have still shows, beside the row's result.
    expect(within(bad as HTMLElement).getByText('developer_volume: developer_volume is required for a developer')).toBeTruthy();
    expect(within(dialog).getByText('1 row with errors')).toBeTruthy();
    expect(saveAll.hasAttribute('disabled')).toBe(true);

    await user.upload(within(dialog).getByLabelText('Spreadsheet of products'), csv('good.csv', 'code,name\nBRK-GL-07,Bracken Gloss 7 Copper\n'));
    await waitFor(() => expect(within(dialog).getByText('0 rows with errors')).toBeTruthy());
    await waitFor(() => expect(saveAll.hasAttribute('disabled')).toBe(false));
    await user.click(saveAll);

    expect(await screen.findByText('Saved from good.csv: 1 product added, 1 updated, 0 unchanged.')).toBeTruthy();
    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Upload products' })).toBeNull());
    expect(sent.map((s) => s.commit)).toEqual(['false', 'false', 'true']);
    expect(sent[2]?.body).toContain('filename="good.csv"');
    expect(sent[2]?.body).toContain('BRK-GL-07,Bracken Gloss 7 Copper');
  });

  it('answers a file of the wrong type before sending it', async () => {
    const api = fakeApi(catalogue);
    openPage(catalogueOwnerMe, '/menu-and-products?show=products', routes);
    // The file picker's own filter can be switched off: the dialog must still refuse the file.
    const user = userEvent.setup({ applyAccept: false });

    await user.click(await screen.findByRole('button', { name: 'Upload a spreadsheet' }));
    await user.upload(screen.getByLabelText('Spreadsheet of products'), new File(['%PDF'], 'prices.pdf', { type: 'application/pdf' }));

    expect(await screen.findByText('Choose a .csv or .xlsx file.')).toBeTruthy();
    expect(api.calls('POST /api/catalogue/products/import')).toHaveLength(0);
  });

  it('gives the front desk the menu and products to read, with no editing controls', async () => {
    fakeApi(catalogue);
    const { user } = openPage(catalogueDeskMe, '/menu-and-products', routes);

    const menu = await screen.findByRole('table', { name: 'Service menu' });
    expect(within(menu).getByRole('columnheader', { name: 'Lead' })).toBeTruthy();
    expect(within(menu).getAllByRole('cell', { name: '52.00' })).toHaveLength(1);
    const noEditing = () => {
      expect(screen.queryByRole('button', { name: /^New / })).toBeNull();
      expect(screen.queryByRole('button', { name: 'Upload a spreadsheet' })).toBeNull();
      expect(screen.queryByRole('button', { name: /^Edit / })).toBeNull();
    };
    noEditing();

    await user.click(screen.getByRole('tab', { name: /^Products/ }));
    const table = await screen.findByRole('table', { name: 'Products' });
    expect(within(table).getByText('approx.')).toBeTruthy();
    noEditing();

    await user.click(screen.getByRole('tab', { name: /^Stylist levels/ }));
    expect(await screen.findByRole('table', { name: 'Stylist levels' })).toBeTruthy();
    noEditing();
  });

  it('puts the server’s refusal of a product under the field it names', async () => {
    const api = fakeApi({
      ...catalogue,
      'POST /api/catalogue/products': problem(409, 'product.code_taken', 'Another product already has the code "BRK-LT-01".', [
        { field: 'code', message: 'Another product already has the code "BRK-LT-01".' },
      ]),
    });
    const { user } = openPage(catalogueOwnerMe, '/menu-and-products?show=products', routes);

    await user.click(await screen.findByRole('button', { name: 'New product' }));
    await user.type(screen.getByLabelText('Code'), 'BRK-LT-01');
    await user.type(screen.getByLabelText('Name'), 'Bracken Clay Lightener Large');
    await user.selectOptions(screen.getByLabelText('Kind'), 'lightener');
    await user.type(screen.getByLabelText('Container size'), '900');
    await user.type(screen.getByLabelText('Container cost'), '64.80');
    // The cost per gram the server will derive, worked out by the same libs/domain code.
    expect(screen.getByText('0.072000')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Add product' }));

    await waitFor(() => expect(screen.getByLabelText('Code').getAttribute('aria-invalid')).toBe('true'));
    expect(document.activeElement).toBe(screen.getByLabelText('Code'));
    expect(JSON.parse(api.calls('POST /api/catalogue/products')[0]?.body ?? '')).toMatchObject({
      code: 'BRK-LT-01',
      kind: 'lightener',
      containerSize: '900',
      containerUnit: 'g',
      containerCost: '64.80',
      developerVolume: null,
      densityGramsPerMl: null,
    });
  });

  it('edits a service’s prices and puts a refused price under its level', async () => {
    const glaze = services[0]!;
    const api = fakeApi({
      ...catalogue,
      [`PATCH /api/catalogue/services/${glaze.id}`]: problem(400, 'request.invalid', 'Check these fields: prices[1].price.', [
        { field: 'prices[1].price', message: 'price must be a decimal number with at most 2 decimal places' },
      ]),
    });
    const { user } = openPage(catalogueOwnerMe, '/menu-and-products', routes);

    await user.click(await screen.findByRole('button', { name: 'Edit Glaze Refresh' }));
    const lead = screen.getByLabelText('Lead');
    await user.clear(lead);
    await user.type(lead, '52.505{Enter}');

    await waitFor(() => expect(lead.getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByLabelText('Emerging').getAttribute('aria-invalid')).toBeNull();
    expect(screen.getByText('price must be a decimal number with at most 2 decimal places')).toBeTruthy();
    expect(JSON.parse(api.calls(`PATCH /api/catalogue/services/${glaze.id}`)[0]?.body ?? '')).toEqual({
      prices: [
        { levelId: levels[0]!.id, price: '38.00' },
        { levelId: levels[1]!.id, price: '52.505' },
      ],
    });
  });
});
