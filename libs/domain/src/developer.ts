import Big from 'big.js';
import { fieldPath, invalid, readArray, readDecimal, readObject } from './fields.js';
import { roundHalfUp, roundQuotient, sum } from './money.js';

// Common practice in the trade: 10 / 20 / 30 / 40 volume = 3 / 6 / 9 / 12 % hydrogen peroxide.
const PERCENT_PER_VOLUME = new Big('0.3');

// IUPAC/CIAAW standard atomic weights (abridged): H 1.008, O 15.999.
const MOLAR_MASS_H2O2 = new Big('1.008').times(2).plus(new Big('15.999').times(2));
// SI 2019 exact gas constant (CODATA), 0 °C and 1 atm: R·T/p = 22.41397 L/mol.
const GAS_CONSTANT = new Big('8.314462618');
const KELVIN_AT_0C = new Big('273.15');
const ATMOSPHERE_KPA = new Big('101.325');

/** Percent hydrogen peroxide for a labelled volume, 2 decimals. */
export function developerPercent(volume: string): string {
  const value = readDecimal(volume, 'volume', { min: '0' });
  return roundHalfUp(value.times(PERCENT_PER_VOLUME), 2).toFixed(2);
}

/** Labelled volume for a percent of hydrogen peroxide, 1 decimal. */
export function developerVolumeFromPercent(percent: string): string {
  const value = readDecimal(percent, 'percent', { min: '0', max: '100' });
  return roundQuotient(value, PERCENT_PER_VOLUME, 1).toFixed(1);
}

/**
 * Litres of O₂ at 0 °C and 1 atm released per litre of a `percentWv` % w/v solution (2 H₂O₂ → 2 H₂O + O₂),
 * 2 decimals: grams per litre ÷ molar mass × ½ × molar volume, divided once so the rounding is exact.
 */
export function oxygenVolumeStrength(percentWv: string): string {
  const value = readDecimal(percentWv, 'percentWv', { min: '0' });
  const numerator = value.times(10).times(GAS_CONSTANT).times(KELVIN_AT_0C);
  const denominator = MOLAR_MASS_H2O2.times(2).times(ATMOSPHERE_KPA);
  return roundQuotient(numerator, denominator, 2).toFixed(2);
}

export type DeveloperPart = { volume: Big; grams: Big };

/** Amount-weighted mean volume to 1 decimal; null when the parts weigh nothing. */
export function weightedVolume(parts: DeveloperPart[]): Big | null {
  const grams = sum(parts.map((part) => part.grams));
  if (grams.eq(0)) return null;
  return roundQuotient(sum(parts.map((part) => part.volume.times(part.grams))), grams, 1);
}

/** Strength of mixed developers; a neutral diluent is a part of volume "0". */
export function mixDevelopers(parts: { volume: string; grams: string }[]): string {
  const read = readArray(parts, 'parts').map((raw, i) => {
    const field = fieldPath('parts', i);
    const part = readObject(raw, field);
    return {
      volume: readDecimal(part.volume, fieldPath(field, 'volume'), { min: '0' }),
      grams: readDecimal(part.grams, fieldPath(field, 'grams'), { min: '0' }),
    };
  });
  const mean = weightedVolume(read);
  if (mean === null) throw invalid('parts', 'parts must weigh more than 0 grams in total');
  return mean.toFixed(1);
}
