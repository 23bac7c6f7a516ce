import type { components } from '../../lib/api-schema';
import { stylistMe } from '../../test/sessions';
import type { MyEarnings } from './api/earnings-queries';

type MeView = components['schemas']['MeView'];

// Invented people and figures; tiers are common practice in the trade (35 % / 40 % / 45 %), not a source's.
const staffId = 'a7e3c2d1-5b4f-4e6a-9c8d-2f1e0b3a4c5d';

export const linkedStylistMe: MeView = {
  ...stylistMe,
  staffId,
  rules: [...stylistMe.rules, ['read', 'StaffPay', { organisationId: stylistMe.organisationId, staffId }]],
};

export const statement = {
  runId: 'd1c2b3a4-0000-4000-8000-00000000a001',
  lineId: 'd1c2b3a4-0000-4000-8000-00000000b001',
  startDate: '2026-02-23',
  endDate: '2026-03-01',
  grossPay: '1184.37',
  status: 'exported' as const,
};

export const earnings: MyEarnings = {
  staffId,
  staffName: 'Oren Vale',
  branch: { id: stylistMe.branches[0]!.id, name: 'Elmstead', timeZone: 'America/Chicago', currency: 'USD' },
  today: '2026-03-05',
  missing: [],
  period: { startDate: '2026-03-02', endDate: '2026-03-08', id: null },
  throughDate: '2026-03-04',
  plan: {
    name: 'Floor',
    tierMode: 'marginal',
    tiers: [
      { from: '0', rate: '0.35' },
      { from: '200', rate: '0.40' },
      { from: '400', rate: '0.45' },
    ],
    productChargeMode: 'actual-cost',
    retailRate: '0.10',
  },
  figures: {
    serviceRevenue: '248.00',
    productCharge: '24.20',
    commissionableRevenue: '223.80',
    serviceCommission: '79.52',
    tierBreakdown: [
      { from: '0.00', to: '200.00', rate: '0.35', base: '200.00', commission: '70.00' },
      { from: '200.00', to: '400.00', rate: '0.4', base: '23.80', commission: '9.52' },
      { from: '400.00', to: null, rate: '0.45', base: '0.00', commission: '0.00' },
    ],
    retailRevenue: '24.00',
    retailCommission: '2.40',
    tips: '25.00',
    hours: '15.5',
    hourlyPay: '0.00',
  },
  nextTier: {
    currentTier: { index: 1, from: '200.00', to: '400.00', rate: '0.4' },
    nextTier: { index: 2, from: '400.00', rate: '0.45' },
    revenueToNextTier: '176.20',
    commissionAtNextTier: '150.00',
    commissionAdded: '70.48',
    progress: '0.119',
  },
  days: [
    { date: '2026-03-02', serviceRevenue: '0.00', productCharge: '0.00', retailRevenue: '0.00', tips: '0.00' },
    { date: '2026-03-03', serviceRevenue: '178.00', productCharge: '13.20', retailRevenue: '24.00', tips: '15.00' },
    { date: '2026-03-04', serviceRevenue: '70.00', productCharge: '11.00', retailRevenue: '0.00', tips: '10.00' },
  ],
  statements: [statement],
};
