import type { components } from '../lib/api-schema';

type SessionView = components['schemas']['SessionView'];
type MeView = components['schemas']['MeView'];
type BranchView = components['schemas']['BranchView'];

const organisationId = '6f0c8a52-1d7e-4e11-9c55-0a4b3e2f7d10';
const elmstead = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01', name: 'Elmstead', timeZone: 'America/Chicago', currency: 'USD' };
const quarry = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a02', name: 'Quarry Lane', timeZone: 'America/Denver', currency: 'USD' };

// Rules as the API packs them (packRules), for the scopes of DESIGN.md §2.
export const ownerMe: MeView = {
  id: 'c0ffee00-0000-4000-8000-000000000001',
  email: 'owner@example.test',
  displayName: 'Ines Marwood',
  role: 'owner',
  organisationId,
  organisationName: 'Fernhollow Hair Studios',
  staffId: null,
  branches: [elmstead, quarry],
  rules: [
    ['read', 'Organisation', { id: organisationId }],
    ['update', 'Organisation', { id: organisationId }],
    ['manage', 'Branch', { organisationId }],
    ['read', 'User', { id: 'c0ffee00-0000-4000-8000-000000000001' }],
    ['manage', 'User', { organisationId }],
  ],
};

export const stylistMe: MeView = {
  id: 'c0ffee00-0000-4000-8000-000000000004',
  email: 'stylist@example.test',
  displayName: 'Oren Vale',
  role: 'stylist',
  organisationId,
  organisationName: 'Fernhollow Hair Studios',
  staffId: null,
  branches: [elmstead],
  rules: [
    ['read', 'Organisation', { id: organisationId }],
    ['read', 'Branch', { organisationId, id: { $in: [elmstead.id] } }],
    ['read', 'User', { id: 'c0ffee00-0000-4000-8000-000000000004' }],
  ],
};

export const sessionOf = (user: MeView, accessToken = `token-for-${user.role}`): SessionView => ({ accessToken, expiresIn: 600, user });

export const branchRows: BranchView[] = [
  {
    ...elmstead,
    minimumWage: '7.25',
    overtimeAfterHours: '40',
    overtimeMultiplier: '1.5',
    commissionExemption: true,
    retailTaxRate: '0.0825',
    varianceNoteThreshold: '5.00',
    patchTestMaxAgeDays: 180,
    royaltyRate: '0.06',
    marketingFundRate: '0.015',
    createdAt: '2026-01-05T15:00:00.000Z',
    updatedAt: '2026-01-05T15:00:00.000Z',
  },
  {
    ...quarry,
    minimumWage: '14.81',
    overtimeAfterHours: '40',
    overtimeMultiplier: '1.5',
    commissionExemption: false,
    retailTaxRate: '0.029',
    varianceNoteThreshold: '5.00',
    patchTestMaxAgeDays: 180,
    royaltyRate: '0',
    marketingFundRate: '0',
    createdAt: '2026-01-05T15:00:00.000Z',
    updatedAt: '2026-01-05T15:00:00.000Z',
  },
];
