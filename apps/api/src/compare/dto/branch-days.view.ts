import { CompareBranchView } from './compare-branch.view.js';

/** One business date of a branch: the branch row's figures that make sense for a single day. */
export class BranchDayFiguresView {
  date: string;
  /** Whether the manager has closed this day; an open day's figures can still change. */
  dayClosed: boolean;
  serviceRevenue: string;
  retailRevenue: string;
  tickets: number;
  averageTicket: string | null;
  colourServiceRevenue: string;
  colourProductCost: string;
  colourCostShare: string | null;
  retailToServiceRatio: string | null;
  stylistHours: string;
  revenuePerStylistHour: string | null;
  newClients: number;
  returningClients: number;
  tips: string;
  voids: number;
  refunds: number;
  refundedAmount: string;
}

export class BranchDaysView {
  branch: CompareBranchView;
  from: string;
  to: string;
  /** Every business date of the range, oldest first. */
  rows: BranchDayFiguresView[];
}
