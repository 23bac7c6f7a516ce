import { DayCloseView } from './day-close.view.js';

export class TicketCountsView {
  open: number;
  closed: number;
  void: number;
}

export class OpenTicketView {
  id: string;
  number: number;
  clientName: string | null;
  due: string;
}

export class MissingBowlView {
  ticketId: string;
  number: number;
  serviceName: string;
  staffName: string;
}

export class CategoryRevenueView {
  category: string;
  amount: string;
}

export class StaffTipsView {
  staffId: string;
  staffName: string;
  amount: string;
}

export class AdjustmentView {
  id: string;
  category: string;
  amount: string;
  reason: string;
  ticketId: string | null;
  staffId: string | null;
}

/** Everything the manager checks before closing a branch's day, and the close itself once done. */
export class DayPreviewView {
  branchId: string;
  branchName: string;
  businessDate: string;
  /** Null until the day is closed. */
  close: DayCloseView | null;
  ticketsByStatus: TicketCountsView;
  openTickets: OpenTicketView[];
  colourLinesWithoutBowl: MissingBowlView[];
  revenueByCategory: CategoryRevenueView[];
  serviceRevenue: string;
  retailRevenue: string;
  retailTax: string;
  tipsByStaff: StaffTipsView[];
  /** What the colour and lightener mixed that day cost the salon, from the bowls. */
  colourProductCost: string;
  cashFromTickets: string;
  cashAdjustments: string;
  /** Cash the drawer should hold from the day's tickets and cash adjustments. */
  expectedCash: string;
  cardTotalTickets: string;
  /** The card processor's own total of the branch's card payments that day, less refunds. */
  cardTotalProcessor: string;
  pendingCardPayments: number;
  adjustments: AdjustmentView[];
  /** A variance above this needs a note. */
  varianceNoteThreshold: string;
  /** True when nothing stands in the way of closing. */
  readyToClose: boolean;
}
