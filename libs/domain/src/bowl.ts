import Big from 'big.js';
import { weightedVolume } from './developer.js';
import { fieldPath, invalid, readArray, readChoice, readDecimal, readObject, readString } from './fields.js';
import { moneyText, plainText, roundQuotient, sum } from './money.js';

export type BowlComponentKind = 'colour' | 'lightener' | 'developer' | 'additive';

export type Bowl = {
  components: {
    productId: string;
    kind: BowlComponentKind;
    grams: string;
    costPerGram: string;
    volume?: string;
  }[];
  leftoverGrams?: string;
};

export type BowlCost = {
  totalGrams: string;
  colourGrams: string;
  developerGrams: string;
  ratio: string | null;
  developerVolume: string | null;
  cost: string;
  wasteGrams: string;
  wasteCost: string;
};

const KINDS: readonly BowlComponentKind[] = ['colour', 'lightener', 'developer', 'additive'];

/** Catalogue kinds that go in a bowl, and the part each plays; retail products never do. */
export const bowlPartOfProductKind = {
  permanent: 'colour',
  demi_permanent: 'colour',
  lightener: 'lightener',
  developer: 'developer',
  treatment: 'additive',
} as const satisfies Record<string, BowlComponentKind>;

export type BowlProductKind = keyof typeof bowlPartOfProductKind;

export const isBowlProductKind = (kind: string): kind is BowlProductKind => Object.hasOwn(bowlPartOfProductKind, kind);

export function costBowl(bowl: Bowl): BowlCost {
  const input = readObject(bowl, '');
  const components = readArray(input.components, 'components').map((raw, i) => {
    const field = fieldPath('components', i);
    const component = readObject(raw, field);
    readString(component.productId, fieldPath(field, 'productId'));
    const kind = readChoice(component.kind, KINDS, fieldPath(field, 'kind'));
    return {
      kind,
      grams: readDecimal(component.grams, fieldPath(field, 'grams'), { min: '0' }),
      costPerGram: readDecimal(component.costPerGram, fieldPath(field, 'costPerGram'), { min: '0' }),
      volume:
        kind === 'developer'
          ? readDecimal(component.volume, fieldPath(field, 'volume'), { min: '0' })
          : new Big(0),
    };
  });
  const leftover = readDecimal(input.leftoverGrams ?? '0', 'leftoverGrams', { min: '0' });

  const totalGrams = sum(components.map((c) => c.grams));
  const colourGrams = sum(components.filter((c) => c.kind === 'colour' || c.kind === 'lightener').map((c) => c.grams));
  const developers = components.filter((c) => c.kind === 'developer');
  const developerGrams = sum(developers.map((c) => c.grams));
  const cost = sum(components.map((c) => c.grams.times(c.costPerGram)));
  if (leftover.gt(totalGrams)) {
    throw invalid('leftoverGrams', 'leftoverGrams cannot exceed the grams mixed in the bowl', 'bowl.leftover_exceeds_mix');
  }
  const developerVolume = weightedVolume(developers);

  return {
    totalGrams: plainText(totalGrams),
    colourGrams: plainText(colourGrams),
    developerGrams: plainText(developerGrams),
    ratio: colourGrams.eq(0) ? null : roundQuotient(developerGrams, colourGrams, 2).toFixed(2),
    developerVolume: developerVolume === null ? null : developerVolume.toFixed(1),
    cost: moneyText(cost),
    wasteGrams: plainText(leftover),
    // Leftover is costed at the mix's exact average cost per gram, rounded once.
    wasteCost: totalGrams.eq(0) ? '0.00' : roundQuotient(cost.times(leftover), totalGrams, 2).toFixed(2),
  };
}
