/**
 * One branch's figures over a range (or the totals of every branch shown). Money is a decimal string
 * ("123.45"); shares and ratios are fractions to four places ("0.1834"); a figure is null where its base is
 * zero or absent. GET /api/compare/definitions says exactly how each one is counted.
 */
export class BranchFiguresView {
  /** null on the totals row. */
  branchId: string | null;
  branchName: string;
  serviceRevenue: string;
  retailRevenue: string;
  tickets: number;
  averageTicket: string | null;
  colourServiceRevenue: string;
  colourProductCost: string;
  colourCostShare: string | null;
  /** null when no approved payroll run's pay period lies wholly in the range. */
  productChargeRecovered: string | null;
  retailToServiceRatio: string | null;
  stylistHours: string;
  revenuePerStylistHour: string | null;
  newClients: number;
  returningClients: number;
  rebookingRate: string | null;
  tips: string;
  /** null when no approved payroll run's pay period lies wholly in the range. */
  commissionCost: string | null;
  commissionCostShare: string | null;
  voids: number;
  refunds: number;
  refundedAmount: string;
}

export class BranchComparisonView {
  from: string;
  to: string;
  rebookingDays: number;
  /** The branches the caller may see, by name. */
  rows: BranchFiguresView[];
  totals: BranchFiguresView;
}
