export class FigureDefinitionView {
  /** The field name in the views (e.g. `colourCostShare`). */
  figure: string;
  /** A short column heading. */
  label: string;
  /** How the figure is counted, in plain words (the README says the same). */
  definition: string;
}

export class CompareDefinitionsView {
  /** The figures of the comparison, its days and its stylists. */
  figures: FigureDefinitionView[];
  /** The figures of the monthly fee statement. */
  fees: FigureDefinitionView[];
  feeNote: string;
}
