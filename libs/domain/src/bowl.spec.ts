import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { costBowl, type Bowl } from './bowl.js';
import { DomainError } from './errors.js';

describe('costBowl', () => {
  it('mixes a permanent colour 1:1 with 20 volume developer (common practice in the trade: permanent colour 1:1)', () => {
    const bowl: Bowl = {
      components: [
        { productId: 'house-permanent-6', kind: 'colour', grams: '60', costPerGram: '0.180000' },
        { productId: 'dev-20', kind: 'developer', grams: '60', costPerGram: '0.012000', volume: '20' },
      ],
    };
    expect(costBowl(bowl)).toEqual({
      totalGrams: '120',
      colourGrams: '60',
      developerGrams: '60',
      ratio: '1.00',
      developerVolume: '20.0',
      cost: '11.52', // 60 × 0.18 + 60 × 0.012
      wasteGrams: '0',
      wasteCost: '0.00',
    });
  });

  it('mixes lightener about 1:2 across two developers and costs the leftover at the mix average (common practice in the trade: lightener 1:1.5 to 1:2)', () => {
    const result = costBowl({
      components: [
        { productId: 'house-lightener', kind: 'lightener', grams: '40', costPerGram: '0.09' },
        { productId: 'dev-20', kind: 'developer', grams: '40', costPerGram: '0.01', volume: '20' },
        { productId: 'dev-30', kind: 'developer', grams: '40', costPerGram: '0.011', volume: '30' },
        { productId: 'house-bond-additive', kind: 'additive', grams: '5', costPerGram: '0.6' },
      ],
      leftoverGrams: '25',
    });
    expect(result.ratio).toBe('2.00');
    expect(result.developerVolume).toBe('25.0');
    expect(result.totalGrams).toBe('125');
    expect(result.colourGrams).toBe('40');
    expect(result.cost).toBe('7.44'); // 3.60 + 0.40 + 0.44 + 3.00
    expect(result.wasteCost).toBe('1.49'); // 7.44 / 125 × 25 = 1.488
    expect(result.wasteGrams).toBe('25');
  });

  it('rounds the cost once, from the exact sum of the components', () => {
    const result = costBowl({
      components: [
        { productId: 'a', kind: 'colour', grams: '1', costPerGram: '0.004' },
        { productId: 'b', kind: 'colour', grams: '1', costPerGram: '0.004' },
      ],
    });
    expect(result.cost).toBe('0.01'); // 0.008; rounding each component first would give 0.00
  });

  it('gives no ratio without colour and no developer volume without developer', () => {
    const gloss = costBowl({ components: [{ productId: 'dev-10', kind: 'developer', grams: '50', costPerGram: '0.01', volume: '10' }] });
    expect(gloss.ratio).toBeNull();
    expect(gloss.developerVolume).toBe('10.0');
    const treatment = costBowl({ components: [{ productId: 'mask', kind: 'additive', grams: '30', costPerGram: '0.2' }] });
    expect(treatment.ratio).toBeNull();
    expect(treatment.developerVolume).toBeNull();
  });

  it('refuses bad components with their path', () => {
    const developerWithoutVolume = {
      components: [
        { productId: 'c', kind: 'colour', grams: '30', costPerGram: '0.1' },
        { productId: 'd', kind: 'developer', grams: '30', costPerGram: '0.01' },
      ],
    } as Bowl;
    expect(() => costBowl(developerWithoutVolume)).toThrow(expect.objectContaining({ field: 'components[1].volume' }));
    expect(() => costBowl({ components: [{ productId: 'c', kind: 'colour', grams: '-5', costPerGram: '0.1' }] })).toThrow(
      expect.objectContaining({ field: 'components[0].grams' }),
    );
    expect(() => costBowl({ components: [{ productId: 'c', kind: 'toner' as never, grams: '5', costPerGram: '0.1' }] })).toThrow(
      expect.objectContaining({ field: 'components[0].kind' }),
    );
    try {
      costBowl({ components: [{ productId: 'c', kind: 'colour', grams: '5', costPerGram: '0.1' }], leftoverGrams: '6' });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DomainError);
      expect(error).toMatchObject({ code: 'bowl.leftover_exceeds_mix', field: 'leftoverGrams' });
    }
  });

  it('costs every bowl as decimal.js does, and never wastes more than it cost (property)', () => {
    const component = fc.record({
      productId: fc.constant('p'),
      kind: fc.constantFrom('colour' as const, 'lightener' as const, 'developer' as const, 'additive' as const),
      grams: fc.integer({ min: 0, max: 300_000 }).map((mg) => `${Math.floor(mg / 1000)}.${String(mg % 1000).padStart(3, '0')}`),
      costPerGram: fc.integer({ min: 0, max: 2_000_000 }).map((u) => `${Math.floor(u / 1e6)}.${String(u % 1e6).padStart(6, '0')}`),
      volume: fc.constantFrom('10', '20', '30', '40'),
    });
    fc.assert(
      fc.property(fc.array(component, { minLength: 1, maxLength: 6 }), fc.integer({ min: 0, max: 100 }), (components, leftoverPercent) => {
        const total = components.reduce((t, c) => t.plus(c.grams), new Decimal(0));
        const leftover = total.times(leftoverPercent).div(100).toDecimalPlaces(3, Decimal.ROUND_DOWN);
        const result = costBowl({ components, leftoverGrams: leftover.toFixed() });
        const exact = components.reduce((t, c) => t.plus(new Decimal(c.grams).times(c.costPerGram)), new Decimal(0));
        expect(result.cost).toBe(exact.toFixed(2, Decimal.ROUND_HALF_UP));
        expect(new Decimal(result.wasteCost).lte(result.cost)).toBe(true);
      }),
    );
  });
});
