import { BlueprintProvider } from '@blueprintjs/core';
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { createMemoryRouter, Outlet, RouterProvider } from 'react-router';
import { AbilityContext, abilityFor } from '../../../lib/ability';
import { createQueryClient } from '../../../lib/query-client';
import { routePaths } from '../../../lib/route-paths';
import { type Me, session } from '../../../lib/session';
import { json } from '../../../test/fake-api';
import { sessionOf } from '../../../test/sessions';
import type { Product, Service, StaffMember } from '../api/picker-queries';
import type { ServiceLine, Ticket } from '../api/ticket-queries';
import { TicketEditorRoute, ticketEditorLoader } from '../routes/ticket-editor.route';

// An invented salon for the tests: Fernhollow Hair Studios, its Elmstead branch and its people.
const organisationId = '6f0c8a52-1d7e-4e11-9c55-0a4b3e2f7d10';
export const branch = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01', name: 'Elmstead', timeZone: 'America/Chicago', currency: 'USD' };
const inBranch = { organisationId, branchId: { $in: [branch.id] } };

const senior = 'a0000000-0000-4000-8000-00000000000a';
const junior = 'a0000000-0000-4000-8000-00000000000b';
export const wrenId = 'f0000000-0000-4000-8000-000000000001';
export const tobyId = 'f0000000-0000-4000-8000-000000000002';

const me = (role: Me['role'], displayName: string, staffId: string | null, rules: unknown[][]): Me => ({
  id: `c0ffee00-0000-4000-8000-00000000000${role.length}`,
  email: `${role}@example.test`,
  displayName,
  role,
  organisationId,
  organisationName: 'Fernhollow Hair Studios',
  staffId,
  branches: [branch],
  rules: [['read', 'Catalogue', { organisationId }], ['read', 'Staff', { organisationId, homeBranchId: { $in: [branch.id] } }], ...rules],
});

// Rules as the API packs them, for the scopes of DESIGN.md §2.
export const frontDeskMe = me('front_desk', 'Maren Ashby', null, [['read,create,update,pay,close', 'Ticket', inBranch]]);
export const managerMe = me('manager', 'Oswin Pell', null, [
  ['read,create,update,pay,close,void,refund', 'Ticket', inBranch],
  ['manage', 'DayClose', inBranch],
]);
export const stylistMe = me('stylist', 'Wren Halloway', wrenId, [['read,update', 'Ticket', { ...inBranch, staffIds: wrenId }]]);

export const staff: StaffMember[] = [
  { id: wrenId, displayName: 'Wren Halloway', email: null, levelId: senior, levelName: 'Senior', homeBranchId: branch.id, homeBranchName: 'Elmstead', userId: null, active: true, createdAt: '', updatedAt: '' },
  { id: tobyId, displayName: 'Toby Quill', email: null, levelId: junior, levelName: 'Associate', homeBranchId: branch.id, homeBranchName: 'Elmstead', userId: null, active: true, createdAt: '', updatedAt: '' },
];

export const services: Service[] = [
  {
    id: 'e0000000-0000-4000-8000-000000000001',
    name: 'Full Colour',
    category: 'Colour',
    durationMinutes: 90,
    isColour: true,
    active: true,
    prices: [
      { levelId: junior, levelName: 'Associate', price: '90.00' },
      { levelId: senior, levelName: 'Senior', price: '125.00' },
    ],
    createdAt: '',
    updatedAt: '',
  },
  {
    id: 'e0000000-0000-4000-8000-000000000002',
    name: 'Cut & Style',
    category: 'Cuts',
    durationMinutes: 45,
    isColour: false,
    active: true,
    prices: [{ levelId: senior, levelName: 'Senior', price: '70.00' }],
    createdAt: '',
    updatedAt: '',
  },
];

const product = (id: string, name: string, kind: Product['kind'], costPerGram: string, extra: Partial<Product> = {}): Product => ({
  id,
  code: id.slice(-4),
  name,
  kind,
  developerVolume: null,
  containerSize: '60',
  containerUnit: 'g',
  densityGramsPerMl: null,
  containerCost: '1',
  retailPrice: null,
  costPerGram,
  costPerGramApproximate: false,
  active: true,
  createdAt: '',
  updatedAt: '',
  ...extra,
});

export const products: Product[] = [
  product('d0000000-0000-4000-8000-000000000001', 'Fernhollow Crème 6 Walnut', 'permanent', '0.141096'),
  product('d0000000-0000-4000-8000-000000000002', 'Fernhollow Developer 20 vol', 'developer', '0.011914', { developerVolume: '20' }),
  product('d0000000-0000-4000-8000-000000000003', 'Fernhollow Rinse Shampoo', 'retail', '0.030000', { retailPrice: '24.00' }),
];

export const ticketId = '70000000-0000-4000-8000-000000000001';

export function serviceLine(overrides: Partial<ServiceLine> = {}): ServiceLine {
  return {
    id: '71000000-0000-4000-8000-000000000001',
    serviceId: services[0]!.id,
    serviceName: 'Full Colour',
    isColour: true,
    staffId: wrenId,
    staffName: 'Wren Halloway',
    assistantStaffId: null,
    assistantName: null,
    assistantShare: null,
    listPrice: '125.00',
    discount: '0.00',
    price: '125.00',
    noProductReason: null,
    bookedOn: '2026-03-14',
    refundOfLineId: null,
    bowls: [],
    ...overrides,
  };
}

export function ticket(overrides: Partial<Ticket> = {}): Ticket {
  return {
    id: ticketId,
    branchId: branch.id,
    branchName: branch.name,
    businessDate: '2026-03-14',
    number: 7,
    status: 'open',
    client: { id: '72000000-0000-4000-8000-000000000001', name: 'Perrin Oakes', allergyNotes: '', lastPatchTestOn: null },
    openedAt: '2026-03-14T15:00:00.000Z',
    closedAt: null,
    voidReason: null,
    locked: false,
    refunded: false,
    serviceLines: [],
    retailLines: [],
    tips: [],
    payments: [],
    totals: { services: '0.00', retail: '0.00', tax: '0.00', tips: '0.00', total: '0.00', paid: '0.00', due: '0.00' },
    patchTest: { needed: false, lastPatchTestOn: null, acknowledgedAt: null },
    ...overrides,
  };
}

/** The catalogue and the people every ticket page asks for. */
export const pickerReplies = {
  'GET /api/catalogue/services': json(200, services),
  'GET /api/catalogue/products': json(200, products),
  'GET /api/staff': json(200, staff),
};

/** The ticket editor as `person` sees it, in a router of its own; the network is faked by the caller. */
export function openTicketEditor(person: Me) {
  session.start(sessionOf(person));
  const queryClient = createQueryClient();
  const router = createMemoryRouter(
    [
      {
        Component: () => (
          <AbilityContext value={abilityFor(person)}>
            <Suspense fallback={null}>
              <Outlet />
            </Suspense>
          </AbilityContext>
        ),
        children: [
          { path: routePaths.ticket, loader: ticketEditorLoader(queryClient), Component: TicketEditorRoute },
          { path: routePaths.today, Component: () => <p>Today</p> },
        ],
      },
    ],
    { initialEntries: [`/tickets/${ticketId}`] },
  );
  render(
    <QueryClientProvider client={queryClient}>
      <BlueprintProvider>
        <RouterProvider router={router} />
      </BlueprintProvider>
    </QueryClientProvider>,
  );
  return userEvent.setup();
}
