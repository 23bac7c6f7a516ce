/** Where an imported change came from: the uploaded file's name and the row as the spreadsheet numbers it. */
export type ImportedFrom = { file: string; row: number };
