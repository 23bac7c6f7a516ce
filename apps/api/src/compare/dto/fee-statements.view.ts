/** A branch's franchise fees for a month; rates are fractions ("0.06" = 6 %), amounts decimal strings. */
export class FeeStatementRowView {
  /** null on the totals row. */
  branchId: string | null;
  branchName: string;
  grossSales: string;
  /** null on the totals row. */
  royaltyRate: string | null;
  royaltyAmount: string;
  /** null on the totals row. */
  marketingFundRate: string | null;
  marketingFundAmount: string;
  totalFees: string;
}

export class FeeStatementsView {
  /** YYYY-MM. */
  month: string;
  from: string;
  to: string;
  rows: FeeStatementRowView[];
  totals: FeeStatementRowView;
  /** To be shown with the figures: they are to be confirmed against the franchise agreement. */
  note: string;
}
