import { CompareBranchView } from './compare-branch.view.js';

/** One staff member's figures at the branch over the range. */
export class StylistFiguresView {
  staffId: string;
  staffName: string;
  serviceRevenue: string;
  colourServiceRevenue: string;
  colourProductCost: string;
  retailRevenue: string;
  tickets: number;
  averageTicket: string | null;
  hours: string;
  revenuePerHour: string | null;
  tips: string;
}

export class BranchStylistsView {
  branch: CompareBranchView;
  from: string;
  to: string;
  /** Staff with a line, a sale, a tip or hours at the branch in the range, by name. */
  rows: StylistFiguresView[];
}
