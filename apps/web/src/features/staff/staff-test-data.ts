import type { Me } from '../../lib/session';
import { ownerMe } from '../../test/sessions';
import type { Level, StaffMember } from './api/staff-queries';

const organisationId = ownerMe.organisationId;
const [elmstead, quarry] = ownerMe.branches as [Me['branches'][number], Me['branches'][number]];
export { elmstead, quarry };

// Rules as the API packs them (staff.policies.ts).
export const staffOwnerMe: Me = {
  ...ownerMe,
  rules: [...ownerMe.rules, ['manage', 'Staff', { organisationId }], ['manage', 'StaffPay', { organisationId }], ['read', 'Catalogue', { organisationId }]],
};

export const staffManagerMe: Me = {
  ...ownerMe,
  id: 'c0ffee00-0000-4000-8000-000000000002',
  role: 'manager',
  displayName: 'Halvard Nyquist-Oduya',
  rules: [
    ['read', 'Organisation', { id: organisationId }],
    ['manage', 'Staff', { organisationId, homeBranchId: { $in: [elmstead.id, quarry.id] } }],
    ['read', 'StaffPay', { organisationId, homeBranchId: { $in: [elmstead.id, quarry.id] } }],
  ],
};

export const staffDeskMe: Me = {
  ...ownerMe,
  id: 'c0ffee00-0000-4000-8000-000000000003',
  role: 'front_desk',
  displayName: 'Perpetua Lindqvist-Hale',
  branches: [elmstead],
  rules: [['read', 'Staff', { organisationId, homeBranchId: { $in: [elmstead.id] } }]],
};

export const levels: Level[] = [
  { id: '1e7e1000-0000-4000-8000-000000000001', name: 'Emerging', rank: 1 },
  { id: '1e7e1000-0000-4000-8000-000000000002', name: 'Lead', rank: 2 },
];

const stamp = { createdAt: '2026-03-02T15:00:00.000Z', updatedAt: '2026-03-02T15:00:00.000Z' };

/** Staff as the server shows them to someone who may see pay: with `hourlyRate`. */
export const staffWithPay: StaffMember[] = [
  { id: '57aff000-0000-4000-8000-000000000001', displayName: 'Jorunn Aldersey', email: 'jorunn@example.test', levelId: levels[1]!.id, levelName: 'Lead', homeBranchId: elmstead.id, homeBranchName: elmstead.name, userId: null, active: true, hourlyRate: '4.50', ...stamp },
  { id: '57aff000-0000-4000-8000-000000000002', displayName: 'Tamsin Orrell', email: null, levelId: levels[0]!.id, levelName: 'Emerging', homeBranchId: quarry.id, homeBranchName: quarry.name, userId: 'u5e70000-0000-4000-8000-000000000002', active: true, hourlyRate: null, ...stamp },
  { id: '57aff000-0000-4000-8000-000000000003', displayName: 'Casimir Wendle', email: null, levelId: levels[0]!.id, levelName: 'Emerging', homeBranchId: elmstead.id, homeBranchName: elmstead.name, userId: null, active: false, hourlyRate: null, ...stamp },
];

/** The same staff as the front desk receives them: no pay figure at all. */
export const staffWithoutPay: StaffMember[] = staffWithPay.filter((s) => s.homeBranchId === elmstead.id).map(({ hourlyRate: _hidden, ...rest }) => rest);
