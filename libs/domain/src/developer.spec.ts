import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { developerPercent, developerVolumeFromPercent, mixDevelopers, oxygenVolumeStrength } from './developer.js';

const D = Decimal.clone({ precision: 60 });

describe('developer volume and percent', () => {
  it.each([
    ['10', '3.00'],
    ['20', '6.00'],
    ['30', '9.00'],
    ['40', '12.00'],
    ['15', '4.50'],
  ])('%s volume is %s %% hydrogen peroxide (common practice in the trade: 10 vol = 3 %%)', (volume, percent) => {
    expect(developerPercent(volume)).toBe(percent);
  });

  it.each([
    ['3', '10.0'],
    ['6', '20.0'],
    ['9', '30.0'],
    ['12', '40.0'],
    ['1.9', '6.3'],
  ])('%s %% is labelled %s volume (common practice in the trade)', (percent, volume) => {
    expect(developerVolumeFromPercent(percent)).toBe(volume);
  });

  it('round-trips any volume given to one decimal (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 400 }), (tenths) => {
        const volume = `${Math.floor(tenths / 10)}.${tenths % 10}`;
        expect(developerVolumeFromPercent(developerPercent(volume))).toBe(volume);
      }),
    );
  });

  it('refuses negative strengths and percentages over 100', () => {
    expect(() => developerPercent('-10')).toThrow(expect.objectContaining({ field: 'volume' }));
    expect(() => developerVolumeFromPercent('101')).toThrow(expect.objectContaining({ field: 'percent' }));
  });
});

describe('oxygenVolumeStrength (2 H₂O₂ → 2 H₂O + O₂)', () => {
  // Molar mass from IUPAC/CIAAW standard atomic weights H 1.008, O 15.999 → 34.014 g/mol;
  // CODATA molar volume of an ideal gas at 273.15 K and 101.325 kPa: 22.41397 L/mol.
  const oracle = (percent: string) => new D(percent).times(10).div('34.014').div(2).times('22.41397');

  it('gives 9.88 volumes for 3 % w/v: the trade\'s "10 volume" label overstates it by about 1.2 % (IUPAC/CIAAW, CODATA)', () => {
    expect(oxygenVolumeStrength('3')).toBe('9.88');
    const overstatement = new D(10).minus(oracle('3')).div(oracle('3'));
    expect(overstatement.gt('0.01') && overstatement.lt('0.02')).toBe(true);
  });

  it.each([
    ['6', '19.77'],
    ['9', '29.65'],
    ['12', '39.54'],
    ['0', '0.00'],
  ])('%s %% w/v releases %s volumes of oxygen (IUPAC/CIAAW atomic weights, CODATA molar volume)', (percent, volumes) => {
    expect(oxygenVolumeStrength(percent)).toBe(volumes);
  });

  it('releases one molar volume, 22.41 L, from 2 mol of H₂O₂ per litre (6.8028 % w/v) (CODATA molar volume 22.41397 L/mol)', () => {
    expect(oxygenVolumeStrength('6.8028')).toBe('22.41');
  });

  it('agrees with an independent decimal.js computation from the published constants (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 5000 }), (hundredths) => {
        const percent = `${Math.floor(hundredths / 100)}.${String(hundredths % 100).padStart(2, '0')}`;
        // 22.41397 is the constant rounded to 7 figures, so allow its own tiny difference on top of half a cent.
        expect(new D(oxygenVolumeStrength(percent)).minus(oracle(percent)).abs().lte('0.00501')).toBe(true);
      }),
    );
  });
});

describe('mixDevelopers', () => {
  it('equal parts of 10 and 20 volume give 15 volume (common practice in the trade)', () => {
    expect(mixDevelopers([{ volume: '10', grams: '30' }, { volume: '20', grams: '30' }])).toBe('15.0');
  });

  it('weights by grams, and a neutral diluent counts as 0 volume (REFERENCES.md: amount-weighted mean)', () => {
    expect(mixDevelopers([{ volume: '20', grams: '30' }, { volume: '40', grams: '10' }])).toBe('25.0');
    expect(mixDevelopers([{ volume: '20', grams: '50' }, { volume: '0', grams: '50' }])).toBe('10.0');
    expect(mixDevelopers([{ volume: '30', grams: '20' }, { volume: '20', grams: '40' }])).toBe('23.3');
  });

  it('lies between the weakest and strongest part and ignores the order of parts (property)', () => {
    const part = fc.record({
      volume: fc.constantFrom('0', '5', '10', '15', '20', '25', '30', '40'),
      grams: fc.integer({ min: 1, max: 200 }).map(String),
    });
    fc.assert(
      fc.property(fc.array(part, { minLength: 1, maxLength: 6 }), (parts) => {
        const mixed = new D(mixDevelopers(parts));
        const volumes = parts.map((p) => new D(p.volume));
        expect(mixed.gte(D.min(...volumes)) && mixed.lte(D.max(...volumes))).toBe(true);
        expect(mixDevelopers([...parts].reverse())).toBe(mixDevelopers(parts));
      }),
    );
  });

  it('refuses an empty mix and names a bad part', () => {
    expect(() => mixDevelopers([])).toThrow(expect.objectContaining({ field: 'parts' }));
    expect(() => mixDevelopers([{ volume: '20', grams: '0' }])).toThrow(expect.objectContaining({ field: 'parts' }));
    expect(() => mixDevelopers([{ volume: '20', grams: '10' }, { volume: '20', grams: '-1' }])).toThrow(
      expect.objectContaining({ field: 'parts[1].grams' }),
    );
  });
});
