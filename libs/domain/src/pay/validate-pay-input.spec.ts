import { describe, expect, it } from 'vitest';
import { DomainError } from '../errors.js';
import type { PayInput } from './types.js';
import { validatePayInput } from './validate-pay-input.js';

function validInput(): PayInput {
  return {
    plan: {
      tierMode: 'marginal',
      tiers: [
        { from: '0', rate: '0.40' },
        { from: '2000', rate: '0.45' },
      ],
      productCharge: { mode: 'actual-cost', markup: '0.10' },
      retailRate: '0.10',
      hourlyRate: '5.00',
    },
    serviceLines: [{ id: 's1', date: '2024-03-04', price: '120.00', isColour: true, productCost: '14.20', share: '0.5' }],
    retailLines: [{ id: 'r1', date: '2024-03-04', amount: '36.00' }],
    tips: [{ date: '2024-03-04', amount: '20.00' }],
    hours: [{ date: '2024-03-04', hours: '8' }],
    wageRules: { minimumWage: '7.25', overtimeAfterHours: '40', overtimeMultiplier: '1.5', workweekStartsOn: 0, commissionExemption: false },
  };
}

/** Applies a change to a fresh valid input and returns the error it raises. */
function errorFrom(change: (input: any) => void): DomainError {
  const input = validInput();
  change(input);
  try {
    validatePayInput(input);
  } catch (error) {
    if (error instanceof DomainError) return error;
    throw error;
  }
  throw new Error('expected a DomainError');
}

describe('validatePayInput (issue 3, rule 8: bad input names its field)', () => {
  it('accepts a complete input and fills the defaults', () => {
    const input = validInput();
    delete input.plan.hourlyRate;
    delete input.serviceLines[0]!.share;
    const valid = validatePayInput(input);
    expect(valid.hourlyRate.toFixed()).toBe('0');
    expect(valid.serviceLines[0]!.share.toFixed()).toBe('1');
    expect(valid.productCharge.value.toFixed()).toBe('0');
  });

  it.each<[string, (input: any) => void, string, string]>([
    ['a non-numeric price', (i) => (i.serviceLines[0].price = 'twelve'), 'serviceLines[0].price', 'domain.invalid_input'],
    ['a price given as a JS number', (i) => (i.serviceLines[0].price = 120), 'serviceLines[0].price', 'domain.invalid_input'],
    ['negative hours', (i) => (i.hours[0].hours = '-1'), 'hours[0].hours', 'domain.invalid_input'],
    ['more than 24 hours on one date', (i) => i.hours.push({ date: '2024-03-04', hours: '16.5' }), 'hours[1].hours', 'domain.invalid_input'],
    ['a first tier not starting at 0', (i) => (i.plan.tiers[0].from = '100'), 'plan.tiers[0].from', 'pay.invalid_tiers'],
    ['tiers not increasing', (i) => (i.plan.tiers[1].from = '0'), 'plan.tiers[1].from', 'pay.invalid_tiers'],
    ['no tiers', (i) => (i.plan.tiers = []), 'plan.tiers', 'pay.invalid_tiers'],
    ['a rate above 1', (i) => (i.plan.tiers[1].rate = '45'), 'plan.tiers[1].rate', 'pay.invalid_tiers'],
    ['a negative rate', (i) => (i.plan.tiers[0].rate = '-0.1'), 'plan.tiers[0].rate', 'pay.invalid_tiers'],
    ['a retail rate above 1', (i) => (i.plan.retailRate = '1.5'), 'plan.retailRate', 'domain.invalid_input'],
    ['an unknown tier mode', (i) => (i.plan.tierMode = 'progressive'), 'plan.tierMode', 'domain.invalid_input'],
    ['an unknown product charge mode', (i) => (i.plan.productCharge.mode = 'half'), 'plan.productCharge.mode', 'domain.invalid_input'],
    ['a percentage charge without a value', (i) => (i.plan.productCharge = { mode: 'percent-of-price' }), 'plan.productCharge.value', 'domain.invalid_input'],
    ['a percentage charge above 1', (i) => (i.plan.productCharge = { mode: 'percent-of-price', value: '10' }), 'plan.productCharge.value', 'domain.invalid_input'],
    ['a negative markup', (i) => (i.plan.productCharge.markup = '-0.2'), 'plan.productCharge.markup', 'domain.invalid_input'],
    ['a share above 1', (i) => (i.serviceLines[0].share = '1.2'), 'serviceLines[0].share', 'domain.invalid_input'],
    ['a negative share', (i) => (i.serviceLines[0].share = '-0.5'), 'serviceLines[0].share', 'domain.invalid_input'],
    ['a negative product cost', (i) => (i.serviceLines[0].productCost = '-3'), 'serviceLines[0].productCost', 'domain.invalid_input'],
    ['isColour not a boolean', (i) => (i.serviceLines[0].isColour = 'yes'), 'serviceLines[0].isColour', 'domain.invalid_input'],
    ['a line without id', (i) => delete i.serviceLines[0].id, 'serviceLines[0].id', 'domain.invalid_input'],
    ['an impossible date', (i) => (i.retailLines[0].date = '2024-02-30'), 'retailLines[0].date', 'domain.invalid_input'],
    ['a bad tip', (i) => (i.tips[0].amount = '1e2'), 'tips[0].amount', 'domain.invalid_input'],
    ['a negative hourly rate', (i) => (i.plan.hourlyRate = '-5'), 'plan.hourlyRate', 'domain.invalid_input'],
    ['a workweek start of 7', (i) => (i.wageRules.workweekStartsOn = 7), 'wageRules.workweekStartsOn', 'domain.invalid_input'],
    ['an overtime multiplier below 1', (i) => (i.wageRules.overtimeMultiplier = '0.5'), 'wageRules.overtimeMultiplier', 'domain.invalid_input'],
    ['a negative minimum wage', (i) => (i.wageRules.minimumWage = '-7.25'), 'wageRules.minimumWage', 'domain.invalid_input'],
    ['a missing exemption switch', (i) => delete i.wageRules.commissionExemption, 'wageRules.commissionExemption', 'domain.invalid_input'],
    ['a missing list', (i) => delete i.retailLines, 'retailLines', 'domain.invalid_input'],
    ['a missing plan', (i) => delete i.plan, 'plan', 'domain.invalid_input'],
  ])('refuses %s', (_, change, field, code) => {
    const error = errorFrom(change);
    expect(error).toMatchObject({ name: 'DomainError', kind: 'invalid', field, code });
    expect(error.message).toContain(field);
  });

  it('refuses something that is not an object at all', () => {
    expect(() => validatePayInput(null)).toThrow(DomainError);
    expect(() => validatePayInput([])).toThrow(DomainError);
  });
});
