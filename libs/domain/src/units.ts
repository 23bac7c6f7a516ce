import Big from 'big.js';
import { readChoice, readDecimal } from './fields.js';
import { roundHalfUp, roundQuotient } from './money.js';

export type MassUnit = 'g' | 'kg' | 'oz' | 'lb';
export type VolumeUnit = 'mL' | 'L' | 'fl oz';
export type ContainerUnit = MassUnit | VolumeUnit;

// NIST Handbook 44 Appendix C, exact: 1 lb = 453.59237 g, 1 oz = 1/16 lb; 1 US fl oz = 1/128 gal of 231 in³.
const GRAMS_PER: Record<MassUnit, string> = { g: '1', kg: '1000', oz: '28.349523125', lb: '453.59237' };
const MILLILITRES_PER: Record<VolumeUnit, string> = { mL: '1', L: '1000', 'fl oz': '29.5735295625' };
const MASS_UNITS = Object.keys(GRAMS_PER) as MassUnit[];
const VOLUME_UNITS = Object.keys(MILLILITRES_PER) as VolumeUnit[];

export function gramsOf(amount: Big, unit: MassUnit): Big {
  return amount.times(GRAMS_PER[unit]);
}

export function millilitresOf(amount: Big, unit: VolumeUnit): Big {
  return amount.times(MILLILITRES_PER[unit]);
}

/** Exact: the result carries every digit of the definition. */
export function toGrams(amount: string, unit: MassUnit): string {
  const value = readDecimal(amount, 'amount');
  return gramsOf(value, readChoice(unit, MASS_UNITS, 'unit')).toFixed();
}

/** Grams as weighed and stored: to the milligram, half-up (a salon scale reads to 0.1 g at best). */
export function toRecordedGrams(amount: string, unit: MassUnit): string {
  return roundHalfUp(new Big(toGrams(amount, unit)), 3).toFixed();
}

export function toMillilitres(amount: string, unit: VolumeUnit): string {
  const value = readDecimal(amount, 'amount');
  return millilitresOf(value, readChoice(unit, VOLUME_UNITS, 'unit')).toFixed();
}

/**
 * Cost of one gram from a container's price and size, to 6 decimals. A volume converts to grams
 * through the product's density; without one, 1 g per mL is assumed and the figure flagged approximate.
 */
export function costPerGram(
  containerCost: string,
  containerSize: string,
  unit: ContainerUnit,
  densityGramsPerMl?: string,
): { costPerGram: string; approximate: boolean } {
  const cost = readDecimal(containerCost, 'containerCost', { min: '0' });
  const size = readDecimal(containerSize, 'containerSize', { positive: true });
  const chosen = readChoice(unit, [...MASS_UNITS, ...VOLUME_UNITS], 'unit');
  const density = densityGramsPerMl === undefined ? undefined : readDecimal(densityGramsPerMl, 'densityGramsPerMl', { positive: true });
  let grams: Big;
  let approximate = false;
  if ((MASS_UNITS as string[]).includes(chosen)) {
    grams = gramsOf(size, chosen as MassUnit);
  } else {
    grams = millilitresOf(size, chosen as VolumeUnit).times(density ?? 1);
    approximate = density === undefined;
  }
  return { costPerGram: roundQuotient(cost, grams, 6).toFixed(6), approximate };
}
