import type { components } from '../../lib/api-schema';
import { businessDateIn } from '../../lib/business-date';
import type { Me } from '../../lib/session';
import { branchRows, ownerMe, stylistMe } from '../../test/sessions';
import type { Client, ClientDetail, Formula } from './api/client-queries';

type BranchView = components['schemas']['BranchView'];

const organisationId = ownerMe.organisationId;
const [elmstead, quarry] = ownerMe.branches as [Me['branches'][number], Me['branches'][number]];
export { elmstead, quarry };

// Rules as the API packs them for these roles (clients.policies.ts, DESIGN.md §2).
export const frontDeskMe: Me = {
  ...stylistMe,
  id: 'c0ffee00-0000-4000-8000-000000000003',
  email: 'desk@example.test',
  displayName: 'Perpetua Lindqvist-Hale',
  role: 'front_desk',
  rules: [
    ['read', 'Organisation', { id: organisationId }],
    ['manage', 'Client', { organisationId, homeBranchId: { $in: [elmstead.id] } }],
  ],
};

export const clientStylistMe: Me = {
  ...stylistMe,
  staffId: 'a11ce000-0000-4000-8000-000000000004',
  rules: [...stylistMe.rules, ['read', 'Client', { organisationId, servedByStaffIds: 'a11ce000-0000-4000-8000-000000000004' }]],
};

export const branchesWithWindows: BranchView[] = branchRows.map((b) => ({ ...b, varianceNoteThreshold: '5.00', patchTestMaxAgeDays: 180 }));

/** A calendar date `days` before today at Elmstead. */
export const daysAgo = (days: number): string => businessDateIn(elmstead.timeZone, new Date(Date.now() - days * 86_400_000));

const firstNames = ['Odile', 'Bram', 'Sunniva', 'Teodor', 'Ilse', 'Corwin', 'Maelis', 'Anselm', 'Perrin', 'Liesl'];
const lastNames = ['Farrowmere', 'Quillfeather', 'Ostrander', 'Vantwest', 'Harrowgate', 'Pellucid'];

export function clientRow(n: number, changes: Partial<Client> = {}): Client {
  return {
    id: `c1e00000-0000-4000-8000-${String(n).padStart(12, '0')}`,
    homeBranchId: elmstead.id,
    homeBranchName: elmstead.name,
    firstName: firstNames[n % firstNames.length] ?? 'Odile',
    lastName: `${lastNames[n % lastNames.length]}-${n}`,
    phone: `(555) 010-${String(1000 + n).slice(1)}`,
    email: null,
    notes: '',
    allergyNotes: '',
    lastPatchTestOn: null,
    createdAt: '2026-03-02T15:00:00.000Z',
    updatedAt: '2026-03-02T15:00:00.000Z',
    ...changes,
  };
}

export function clientDetail(changes: Partial<ClientDetail> = {}): ClientDetail {
  return {
    ...clientRow(7, { firstName: 'Sunniva', lastName: 'Ostrander' }),
    allergyNotes: 'Scalp flared after an ammonia colour in 2025: use the gentle line only.',
    lastPatchTestOn: daysAgo(400),
    patchTest: {
      status: 'expired',
      ageDays: 400,
      validUntil: daysAgo(220),
      onDate: daysAgo(0),
      maxAgeDays: 180,
      acknowledgementRequired: true,
      caution: "The last patch test is older than this branch's 180-day window. Confirm with the client before any colour service.",
    },
    ...changes,
  };
}

export function formulaRow(n: number, changes: Partial<Formula> = {}): Formula {
  return {
    id: `b0e10000-0000-4000-8000-${String(n).padStart(12, '0')}`,
    date: '2026-10-14',
    branchName: elmstead.name,
    serviceName: 'Root Refresh',
    stylistName: 'Jorunn Aldersey',
    mixedByName: 'Jorunn Aldersey',
    components: [
      { productName: 'House Clay Lightener', kind: 'lightener', grams: '30', developerVolume: null },
      { productName: 'House Crème Developer 20', kind: 'developer', grams: '45.0', developerVolume: '20' },
    ],
    totalGrams: '75',
    leftoverGrams: '6.5',
    processingMinutes: 35,
    ratio: '1.50',
    developerVolume: '20.0',
    note: 'Back sections first.',
    ...changes,
  };
}
