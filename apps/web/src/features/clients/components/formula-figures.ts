/** Developer grams per gram of colour or lightener, as the trade writes a mix: "1 : 1.50". */
export const ratioText = (ratio: string | null): string => (ratio === null ? '—' : `1 : ${ratio}`);

/** "20.0" → "20", "30.4" → "30.4": a figure from the server without zeros that carry nothing (text only, no arithmetic). */
export const plainFigure = (value: string): string => (value.includes('.') ? value.replace(/0+$/, '').replace(/\.$/, '') : value);
