export class FormulaComponentView {
  productName: string;
  kind: 'colour' | 'lightener' | 'developer' | 'additive';
  /** Grams weighed, decimal string. */
  grams: string;
  /** Developer strength in volumes, decimal string; developers only. */
  developerVolume: string | null;
}

/** One bowl mixed for the client: what a colourist needs to repeat or adjust the formula. */
export class FormulaView {
  /** The bowl's id. */
  id: string;
  /** The ticket's business date (YYYY-MM-DD) in its branch's time zone. */
  date: string;
  branchName: string;
  serviceName: string;
  /** The stylist of the service line. */
  stylistName: string;
  /** Who weighed the bowl (the stylist or an assistant). */
  mixedByName: string;
  /** In the order they were weighed. */
  components: FormulaComponentView[];
  /** Grams mixed in all, decimal string. */
  totalGrams: string;
  /** Grams left in the bowl after the service, decimal string. */
  leftoverGrams: string;
  processingMinutes: number | null;
  /** Developer grams per gram of colour or lightener, decimal string; null without either. */
  ratio: string | null;
  /** Effective developer strength of the mix in volumes, decimal string; null without developer. */
  developerVolume: string | null;
  note: string;
  /** Product cost of the bowl, decimal string; present only for owners, managers and accountants. */
  cost?: string;
}

export class FormulaPageView {
  /** Newest first: by business date, then by when the bowl was recorded. */
  items: FormulaView[];
  total: number;
  limit: number;
  offset: number;
}
