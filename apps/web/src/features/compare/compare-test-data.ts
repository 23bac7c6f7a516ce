import type { Me } from '../../lib/session';
import type { BranchComparison, BranchDays, BranchFigures, BranchStylists, BranchTrend, CompareDefinitions, FeeStatements } from './api/compare-queries';

// An invented group, Fernhollow Hair Studios, with three invented branches in one time zone.
const organisationId = '6f0c8a52-1d7e-4e11-9c55-0a4b3e2f7d10';
export const elmstead = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a01', name: 'Elmstead', timeZone: 'America/Chicago', currency: 'USD' };
export const quarry = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a02', name: 'Quarry Lane', timeZone: 'America/Chicago', currency: 'USD' };
export const larkspur = { id: 'b1a7c1de-0c1f-4a43-8a55-3f1f0f7e0a03', name: 'Larkspur Row', timeZone: 'America/Chicago', currency: 'USD' };

export const compareOwnerMe: Me = {
  id: 'c0ffee00-0000-4000-8000-000000000001',
  email: 'owner@example.test',
  displayName: 'Ines Marwood',
  role: 'owner',
  organisationId,
  organisationName: 'Fernhollow Hair Studios',
  staffId: null,
  branches: [elmstead, quarry, larkspur],
  rules: [
    ['manage', 'Branch', { organisationId }],
    ['read', 'BranchFigures', { organisationId }],
    ['read', 'PaySchedule', { organisationId }],
  ],
};

export const compareDeskMe: Me = {
  ...compareOwnerMe,
  id: 'c0ffee00-0000-4000-8000-000000000003',
  email: 'desk@example.test',
  displayName: 'Tamsin Oake',
  role: 'front_desk',
  branches: [elmstead],
  rules: [['read', 'Branch', { organisationId, id: { $in: [elmstead.id] } }]],
};

const zero: Omit<BranchFigures, 'branchId' | 'branchName'> = {
  serviceRevenue: '0.00',
  retailRevenue: '0.00',
  tickets: 0,
  averageTicket: null,
  colourServiceRevenue: '0.00',
  colourProductCost: '0.00',
  colourCostShare: null,
  productChargeRecovered: '0.00',
  retailToServiceRatio: null,
  stylistHours: '0.000',
  revenuePerStylistHour: null,
  newClients: 0,
  returningClients: 0,
  rebookingRate: null,
  tips: '0.00',
  commissionCost: null,
  commissionCostShare: null,
  voids: 0,
  refunds: 0,
  refundedAmount: '0.00',
};

// Figures as the API would send them; the shares and averages are written out by hand from the sums beside them.
export const elmsteadRow: BranchFigures = {
  ...zero,
  branchId: elmstead.id,
  branchName: elmstead.name,
  serviceRevenue: '12480.00',
  retailRevenue: '1872.00',
  tickets: 160,
  averageTicket: '89.70', // 14352.00 / 160
  colourServiceRevenue: '6200.00',
  colourProductCost: '744.00',
  colourCostShare: '0.1200', // 744 / 6200
  productChargeRecovered: '620.00',
  retailToServiceRatio: '0.1500', // 1872 / 12480
  stylistHours: '312.000',
  revenuePerStylistHour: '40.00', // 12480 / 312
  newClients: 31,
  returningClients: 96,
  rebookingRate: '0.5512', // 70 of 127
  tips: '1405.50',
  commissionCost: '5116.80',
  commissionCostShare: '0.4100',
  voids: 2,
  refunds: 1,
  refundedAmount: '65.00',
};

export const quarryRow: BranchFigures = {
  ...zero,
  branchId: quarry.id,
  branchName: quarry.name,
  serviceRevenue: '9120.00',
  retailRevenue: '410.00',
  tickets: 140,
  averageTicket: '68.07', // 9530.00 / 140 = 68.0714…
  colourServiceRevenue: '0.00',
  colourProductCost: '0.00',
  colourCostShare: null,
  retailToServiceRatio: '0.0450', // 410 / 9120 = 0.04495…
  stylistHours: '240.000',
  revenuePerStylistHour: '38.00',
  newClients: 12,
  returningClients: 88,
  rebookingRate: '0.6200',
  tips: '980.00',
};

export const larkspurRow: BranchFigures = {
  ...zero,
  branchId: larkspur.id,
  branchName: larkspur.name,
  serviceRevenue: '15300.00',
  retailRevenue: '2295.00',
  tickets: 170,
  averageTicket: '103.50', // 17595.00 / 170
  colourServiceRevenue: '8100.00',
  colourProductCost: '1215.00',
  colourCostShare: '0.1500',
  productChargeRecovered: '810.00',
  retailToServiceRatio: '0.1500',
  stylistHours: '360.000',
  revenuePerStylistHour: '42.50',
  newClients: 40,
  returningClients: 101,
  rebookingRate: '0.5000',
  tips: '1702.25',
  voids: 1,
};

export const totalsRow: BranchFigures = {
  ...zero,
  branchId: null,
  branchName: 'All branches',
  serviceRevenue: '36900.00',
  retailRevenue: '4577.00',
  tickets: 470,
  averageTicket: '88.25', // 41477.00 / 470 = 88.2489…
  colourServiceRevenue: '14300.00',
  colourProductCost: '1959.00',
  colourCostShare: '0.1370', // 1959 / 14300 = 0.13699…
  productChargeRecovered: '1430.00',
  retailToServiceRatio: '0.1240',
  stylistHours: '912.000',
  revenuePerStylistHour: '40.46',
  newClients: 83,
  returningClients: 285,
  rebookingRate: '0.5598',
  tips: '4087.75',
  voids: 3,
  refunds: 1,
  refundedAmount: '65.00',
};

// Invented wording: the real texts are the API's (GET /api/compare/definitions); the app shows whatever it sends.
export const definitions: CompareDefinitions = {
  figures: [
    { figure: 'averageTicket', label: 'Average ticket', definition: 'Service and retail revenue divided by the number of closed tickets.' },
    { figure: 'colourCostShare', label: 'Colour cost share', definition: 'Colour product cost as a share of colour service revenue.' },
    { figure: 'refundedAmount', label: 'Money refunded', definition: 'What was handed back.' },
  ],
  fees: [
    { figure: 'grossSales', label: 'Gross sales', definition: 'Service and retail revenue of the month, before tax; tips are not sales.' },
    { figure: 'royaltyAmount', label: 'Royalty', definition: 'Gross sales times the royalty rate, to the cent.' },
    { figure: 'marketingFundAmount', label: 'Marketing fund', definition: 'Gross sales times the marketing-fund rate, to the cent.' },
    { figure: 'totalFees', label: 'Total fees', definition: 'Royalty plus marketing fund.' },
  ],
  feeNote: 'Confirm against the franchise agreement.',
};

export const comparison = (from: string, to: string): BranchComparison => ({
  from,
  to,
  rebookingDays: 42,
  rows: [elmsteadRow, quarryRow, larkspurRow],
  totals: totalsRow,
});

const point = (date: string, serviceRevenue: string, retailRevenue: string) => ({
  date,
  serviceRevenue,
  retailRevenue,
  tickets: 10,
  averageTicket: '0.00',
  colourCostShare: null,
});

export const trend = (from: string, to: string): BranchTrend => ({
  from,
  to,
  series: [
    { branchId: elmstead.id, branchName: elmstead.name, points: [point(from, '400.00', '60.00'), point(to, '500.00', '40.00')] },
    { branchId: quarry.id, branchName: quarry.name, points: [point(from, '300.00', '0.00'), point(to, '250.00', '15.50')] },
    { branchId: larkspur.id, branchName: larkspur.name, points: [point(from, '610.00', '90.00'), point(to, '420.00', '30.00')] },
  ],
});

const dayOf = (date: string, dayClosed: boolean, figures: Partial<BranchFigures>): BranchDays['rows'][number] => {
  const { branchId: _id, branchName: _name, productChargeRecovered: _charge, rebookingRate: _rebooking, commissionCost: _cost, commissionCostShare: _share, ...day } = {
    ...elmsteadRow,
    ...figures,
  };
  return { ...day, date, dayClosed };
};

export const elmsteadDays = (from: string, to: string): BranchDays => ({
  branch: elmstead,
  from,
  to,
  rows: [
    dayOf(from, true, { serviceRevenue: '400.00', retailRevenue: '60.00', tickets: 5, averageTicket: '92.00' }),
    dayOf(to, false, { serviceRevenue: '500.00', retailRevenue: '40.00', tickets: 6, averageTicket: '90.00' }),
  ],
});

export const elmsteadStylists = (from: string, to: string): BranchStylists => ({
  branch: elmstead,
  from,
  to,
  rows: [
    {
      staffId: 'f0000000-0000-4000-8000-000000000001',
      staffName: 'Wren Halloway',
      serviceRevenue: '6240.00',
      colourServiceRevenue: '3900.00',
      colourProductCost: '468.00',
      retailRevenue: '936.00',
      tickets: 80,
      averageTicket: '89.70',
      hours: '156.000',
      revenuePerHour: '40.00',
      tips: '702.75',
    },
  ],
});

// Royalty 6 % and marketing fund 2 % of gross sales, each rounded half-up to the cent:
// 14352.00 × 0.06 = 861.12, × 0.02 = 287.04; 9530.55 × 0.055 = 524.18025 → 524.18, × 0.015 = 142.95825 → 142.96.
export const feeStatements = (month: string): FeeStatements => ({
  month,
  from: `${month}-01`,
  to: `${month}-28`,
  rows: [
    {
      branchId: elmstead.id,
      branchName: elmstead.name,
      grossSales: '14352.00',
      royaltyRate: '0.06',
      royaltyAmount: '861.12',
      marketingFundRate: '0.02',
      marketingFundAmount: '287.04',
      totalFees: '1148.16',
    },
    {
      branchId: quarry.id,
      branchName: quarry.name,
      grossSales: '9530.55',
      royaltyRate: '0.055',
      royaltyAmount: '524.18',
      marketingFundRate: '0.015',
      marketingFundAmount: '142.96',
      totalFees: '667.14',
    },
  ],
  totals: {
    branchId: null,
    branchName: 'All branches',
    grossSales: '23882.55',
    royaltyRate: null,
    royaltyAmount: '1385.30',
    marketingFundRate: null,
    marketingFundAmount: '430.00',
    totalFees: '1815.30',
  },
  note: 'These fees follow the rates on each branch; the franchise agreement governs.',
});
