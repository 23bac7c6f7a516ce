import type { Me } from '../../lib/session';
import { ownerMe, stylistMe } from '../../test/sessions';
import type { Level, Product, Service } from './api/catalogue-queries';
import type { ImportResult } from './api/send-sheet';

const organisationId = ownerMe.organisationId;

// Rules as the API packs them (catalogue.policies.ts): everyone reads; owners and managers edit.
export const catalogueOwnerMe: Me = { ...ownerMe, rules: [...ownerMe.rules, ['read', 'Catalogue', { organisationId }], ['manage', 'Catalogue', { organisationId }]] };

export const catalogueDeskMe: Me = {
  ...stylistMe,
  id: 'c0ffee00-0000-4000-8000-000000000003',
  role: 'front_desk',
  displayName: 'Perpetua Lindqvist-Hale',
  rules: [['read', 'Organisation', { id: organisationId }], ['read', 'Catalogue', { organisationId }]],
};

export const levels: Level[] = [
  { id: '1e7e1000-0000-4000-8000-000000000001', name: 'Emerging', rank: 1 },
  { id: '1e7e1000-0000-4000-8000-000000000002', name: 'Lead', rank: 2 },
];

const stamp = { createdAt: '2026-03-02T15:00:00.000Z', updatedAt: '2026-03-02T15:00:00.000Z' };

export const services: Service[] = [
  {
    id: '5e7e1000-0000-4000-8000-000000000001',
    name: 'Glaze Refresh',
    category: 'Colour',
    durationMinutes: 40,
    isColour: true,
    active: true,
    prices: [
      { levelId: levels[0]!.id, levelName: 'Emerging', price: '38.00' },
      { levelId: levels[1]!.id, levelName: 'Lead', price: '52.00' },
    ],
    ...stamp,
  },
  { id: '5e7e1000-0000-4000-8000-000000000002', name: 'Fringe Shape', category: 'Cuts', durationMinutes: 15, isColour: false, active: true, prices: [{ levelId: levels[1]!.id, levelName: 'Lead', price: '14.00' }], ...stamp },
];

export const products: Product[] = [
  {
    id: '9e7e1000-0000-4000-8000-000000000001',
    code: 'BRK-LT-01',
    name: 'Bracken Clay Lightener',
    kind: 'lightener',
    developerVolume: null,
    containerSize: '450',
    containerUnit: 'g',
    densityGramsPerMl: null,
    containerCost: '36.50',
    retailPrice: null,
    costPerGram: '0.081111',
    costPerGramApproximate: false,
    active: true,
    ...stamp,
  },
  {
    id: '9e7e1000-0000-4000-8000-000000000002',
    code: 'BRK-DV-20',
    name: 'Bracken Liquid Developer 20',
    kind: 'developer',
    developerVolume: '20',
    containerSize: '32',
    containerUnit: 'fl oz',
    densityGramsPerMl: null,
    containerCost: '10.25',
    retailPrice: null,
    costPerGram: '0.010831',
    costPerGramApproximate: true,
    active: true,
    ...stamp,
  },
];

export const badPreview: ImportResult = {
  committed: false,
  rows: [
    {
      row: 2,
      action: 'create',
      values: { code: 'BRK-GL-07', name: 'Bracken Gloss 7 Copper', kind: 'demi_permanent', container_size: '60', container_unit: 'mL', container_cost: '7.25' },
      errors: [],
    },
    {
      row: 3,
      action: 'create',
      values: { code: 'BRK-DV-55', name: 'Too Strong Developer', kind: 'developer', container_size: 'abc', container_unit: 'mL', container_cost: '9.00' },
      errors: [
        { field: 'container_size', message: 'container_size must be a number such as 60' },
        { field: 'developer_volume', message: 'developer_volume is required for a developer' },
      ],
    },
  ],
  validRows: 1,
  invalidRows: 1,
  creates: 1,
  updates: 0,
  unchanged: 0,
};

export const goodPreview: ImportResult = {
  committed: false,
  rows: [
    badPreview.rows[0]!,
    {
      row: 3,
      action: 'update',
      values: { code: 'BRK-LT-01', name: 'Bracken Clay Lightener', kind: 'lightener', container_size: '450', container_unit: 'g', container_cost: '38.00' },
      errors: [],
    },
  ],
  validRows: 2,
  invalidRows: 0,
  creates: 1,
  updates: 1,
  unchanged: 0,
};
