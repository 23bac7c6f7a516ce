export class TrendPointView {
  date: string;
  serviceRevenue: string;
  retailRevenue: string;
  tickets: number;
  averageTicket: string | null;
  colourCostShare: string | null;
}

export class BranchTrendSeriesView {
  branchId: string;
  branchName: string;
  /** One point per business date of the range, zeros where nothing was sold. */
  points: TrendPointView[];
}

export class BranchTrendView {
  from: string;
  to: string;
  series: BranchTrendSeriesView[];
}
