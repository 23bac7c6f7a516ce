import { Button, ButtonGroup, H1, HTMLSelect, Intent, NonIdealState, Tab, Tabs } from '@blueprintjs/core';
import { BoxIcon, PlusIcon, UploadIcon } from '@blueprintjs/icons';
import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { data, type LoaderFunctionArgs, useSearchParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { requireUser } from '../../../lib/session';
import { type Level, type Product, type ProductKind, type Service, catalogueQueries } from '../api/catalogue-queries';
import type { SheetKind } from '../api/send-sheet';
import { productKinds } from '../components/catalogue-labels';
import { LevelFormDialog } from '../components/level-form-dialog';
import { LevelTable } from '../components/level-table';
import { ProductFormDialog } from '../components/product-form-dialog';
import { ProductTable } from '../components/product-table';
import { ServiceFormDialog } from '../components/service-form-dialog';
import { ServiceTable } from '../components/service-table';
import { productColumns, productTemplate, serviceColumns, serviceTemplate } from '../components/sheet-columns';
import { UploadDialog } from '../components/upload-dialog';
import '../components/catalogue.css';

export function catalogueLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'Catalogue')) throw data({ message: 'The menu and products are not part of your role.' }, { status: 403 });
    await Promise.all([
      queryClient.ensureQueryData(catalogueQueries.levels()),
      queryClient.ensureQueryData(catalogueQueries.services()),
      queryClient.ensureQueryData(catalogueQueries.products()),
    ]);
    return null;
  };
}

type Part = 'services' | 'products' | 'levels';
const parts: Part[] = ['services', 'products', 'levels'];

type Editing =
  | { part: 'services'; service?: Service }
  | { part: 'products'; product?: Product }
  | { part: 'levels'; level?: Level }
  | null;

export function CatalogueRoute() {
  const [params, setParams] = useSearchParams();
  const shown = parts.find((p) => p === params.get('show')) ?? 'services';
  const { data: levels } = useSuspenseQuery(catalogueQueries.levels());
  const { data: services } = useSuspenseQuery(catalogueQueries.services());
  const { data: products } = useSuspenseQuery(catalogueQueries.products());
  const edits = useAbility().can('update', 'Catalogue');
  const [editing, setEditing] = useState<Editing>(null);
  const [uploading, setUploading] = useState<SheetKind | null>(null);
  const [kind, setKind] = useState<ProductKind | ''>('');

  const show = (part: Part) => setParams(part === 'services' ? {} : { show: part }, { replace: true });
  const listedProducts = kind ? products.filter((p) => p.kind === kind) : products;
  const categories = [...new Set(services.map((s) => s.category))];

  const actions = (part: Part) => {
    if (!edits) return null;
    const add = { services: 'New service', products: 'New product', levels: 'New level' }[part];
    return (
      <ButtonGroup className="tr-catalogue-actions">
        {part !== 'levels' && <Button icon={<UploadIcon />} text="Upload a spreadsheet" onClick={() => setUploading(part)} />}
        <Button intent={Intent.PRIMARY} icon={<PlusIcon />} text={add} onClick={() => setEditing({ part } as Editing)} />
      </ButtonGroup>
    );
  };

  const servicesPanel = (
    <>
      <div className="tr-catalogue-toolbar">
        <p className="tr-muted">Menu prices by stylist level, most junior first. A dash means the level does not offer the service.</p>
        {actions('services')}
      </div>
      {services.length === 0 ? (
        <NonIdealState icon={<BoxIcon />} title="No services yet" description={edits ? 'Add services one by one or upload the whole menu.' : undefined} />
      ) : (
        <ServiceTable services={services} levels={levels} onEdit={edits ? (service) => setEditing({ part: 'services', service }) : undefined} />
      )}
    </>
  );

  const productsPanel = (
    <>
      <div className="tr-catalogue-toolbar">
        <HTMLSelect aria-label="Kind of product" value={kind} onChange={(event) => setKind(event.currentTarget.value as ProductKind | '')}>
          <option value="">Every kind ({products.length})</option>
          {productKinds.map((k) => (
            <option key={k.kind} value={k.kind}>
              {k.label} ({products.filter((p) => p.kind === k.kind).length})
            </option>
          ))}
        </HTMLSelect>
        {actions('products')}
      </div>
      {listedProducts.length === 0 ? (
        <NonIdealState icon={<BoxIcon />} title="No products here yet" description={edits ? 'Add products one by one or upload the catalogue.' : undefined} />
      ) : (
        <ProductTable products={listedProducts} onEdit={edits ? (product) => setEditing({ part: 'products', product }) : undefined} />
      )}
    </>
  );

  const levelsPanel = (
    <>
      <div className="tr-catalogue-toolbar">
        <p className="tr-muted">A stylist’s level sets the menu price of their services.</p>
        {actions('levels')}
      </div>
      {levels.length === 0 ? (
        <NonIdealState icon={<BoxIcon />} title="No levels yet" description={edits ? 'Add the levels your stylists work at, most junior first.' : undefined} />
      ) : (
        <LevelTable levels={levels} onEdit={edits ? (level) => setEditing({ part: 'levels', level }) : undefined} />
      )}
    </>
  );

  return (
    <section className="tr-page tr-catalogue">
      <header className="tr-page-header">
        <div>
          <H1 className="tr-page-title">Menu & products</H1>
          <p className="tr-muted">
            {edits ? 'The services you offer, the products you mix and sell, and the levels that set prices.' : 'The services, products and stylist levels of the business (read only).'}
          </p>
        </div>
      </header>
      <Tabs id="catalogue-parts" selectedTabId={shown} onChange={(id) => show(id as Part)} renderActiveTabPanelOnly size="large">
        <Tab id="services" title={`Service menu (${services.length})`} panel={servicesPanel} />
        <Tab id="products" title={`Products (${products.length})`} panel={productsPanel} />
        <Tab id="levels" title={`Stylist levels (${levels.length})`} panel={levelsPanel} />
      </Tabs>
      <ServiceFormDialog
        isOpen={editing?.part === 'services'}
        service={editing?.part === 'services' ? editing.service : undefined}
        levels={levels}
        categories={categories}
        onClose={() => setEditing(null)}
      />
      <ProductFormDialog isOpen={editing?.part === 'products'} product={editing?.part === 'products' ? editing.product : undefined} onClose={() => setEditing(null)} />
      <LevelFormDialog
        isOpen={editing?.part === 'levels'}
        level={editing?.part === 'levels' ? editing.level : undefined}
        nextRank={Math.max(0, ...levels.map((l) => l.rank)) + 1}
        onClose={() => setEditing(null)}
      />
      <UploadDialog
        kind="products"
        isOpen={uploading === 'products'}
        columns={productColumns}
        template={() => productTemplate(products)}
        onClose={() => setUploading(null)}
      />
      <UploadDialog
        kind="services"
        isOpen={uploading === 'services'}
        columns={serviceColumns(levels)}
        template={() => serviceTemplate(services, levels)}
        onClose={() => setUploading(null)}
      />
    </section>
  );
}
