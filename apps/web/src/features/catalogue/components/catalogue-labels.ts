import type { ContainerUnit, ProductKind } from '../api/catalogue-queries';

export const productKinds: { kind: ProductKind; label: string }[] = [
  { kind: 'permanent', label: 'Permanent colour' },
  { kind: 'demi_permanent', label: 'Demi-permanent' },
  { kind: 'lightener', label: 'Lightener' },
  { kind: 'developer', label: 'Developer' },
  { kind: 'treatment', label: 'Treatment' },
  { kind: 'retail', label: 'Retail' },
];

export const kindLabel = (kind: ProductKind): string => productKinds.find((k) => k.kind === kind)?.label ?? kind;

export const containerUnits: { unit: ContainerUnit; label: string }[] = [
  { unit: 'g', label: 'g (grams)' },
  { unit: 'oz', label: 'oz (ounces by weight)' },
  { unit: 'mL', label: 'mL (millilitres)' },
  { unit: 'fl oz', label: 'fl oz (US fluid ounces)' },
];

export const isVolumeUnit = (unit: ContainerUnit): boolean => unit === 'mL' || unit === 'fl oz';

/** "20.0" → "20", "2.500" → "2.5": a figure from the server without zeros that carry nothing (text only, no arithmetic). */
export const plainFigure = (value: string): string => (value.includes('.') ? value.replace(/0+$/, '').replace(/\.$/, '') : value);

export const APPROXIMATE_COST_NOTE =
  'Approximate: this product is sold by volume and has no density on record, so 1 g per mL is assumed. Add its density (from the safety data sheet) for an exact figure.';
