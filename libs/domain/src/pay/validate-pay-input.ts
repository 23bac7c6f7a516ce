import Big from 'big.js';
import {
  fieldPath,
  invalid,
  readArray,
  readBoolean,
  readChoice,
  readDecimal,
  readObject,
  readOptionalDecimal,
  readString,
} from '../fields.js';
import { parseBusinessDate } from './business-date.js';
import type { HoursEntry, ProductChargeMode, ProductChargeRule, Tier, TierMode, ValidPayInput, WageRules, Weekday } from './types.js';

const TIER_MODES: readonly TierMode[] = ['marginal', 'whole-period'];
const CHARGE_MODES: readonly ProductChargeMode[] = ['none', 'actual-cost', 'percent-of-price', 'fixed-per-colour-service'];
const RATE = { min: '0', max: '1' };
const NOT_NEGATIVE = { min: '0' };
const HOURS_IN_A_DAY = new Big(24);

export const INVALID_TIERS = 'pay.invalid_tiers';

function readTiers(value: unknown): Tier[] {
  const field = 'plan.tiers';
  const raw = readArray(value, field);
  if (raw.length === 0) throw invalid(field, `${field} must list at least one tier`, INVALID_TIERS);
  const tiers = raw.map((entry, i) => {
    const tierField = fieldPath(field, i);
    const tier = readObject(entry, tierField);
    return {
      from: readDecimal(tier.from, fieldPath(tierField, 'from')),
      rate: readDecimal(tier.rate, fieldPath(tierField, 'rate'), { ...RATE, code: INVALID_TIERS }),
    };
  });
  tiers.forEach((tier, i) => {
    const from = fieldPath(fieldPath(field, i), 'from');
    if (i === 0 && !tier.from.eq(0)) throw invalid(from, `${from} must be "0": the first tier starts at zero`, INVALID_TIERS);
    const previous = tiers[i - 1];
    if (previous && tier.from.lte(previous.from)) {
      throw invalid(from, `${from} must be greater than the tier before it (${previous.from.toFixed()})`, INVALID_TIERS);
    }
  });
  return tiers;
}

function readProductCharge(value: unknown): ProductChargeRule {
  const field = 'plan.productCharge';
  const charge = readObject(value, field);
  const mode = readChoice(charge.mode, CHARGE_MODES, fieldPath(field, 'mode'));
  const valueField = fieldPath(field, 'value');
  const needsValue = mode === 'percent-of-price' || mode === 'fixed-per-colour-service';
  if (needsValue && charge.value === undefined) throw invalid(valueField, `${valueField} is required when the mode is "${mode}"`);
  return {
    mode,
    value: readOptionalDecimal(charge.value, valueField, '0', mode === 'percent-of-price' ? RATE : NOT_NEGATIVE),
    markup: readOptionalDecimal(charge.markup, fieldPath(field, 'markup'), '0', NOT_NEGATIVE),
  };
}

function readWageRules(value: unknown): WageRules {
  const field = 'wageRules';
  const rules = readObject(value, field);
  const startsOnField = fieldPath(field, 'workweekStartsOn');
  const startsOn = rules.workweekStartsOn;
  if (typeof startsOn !== 'number' || !Number.isInteger(startsOn) || startsOn < 0 || startsOn > 6) {
    throw invalid(startsOnField, `${startsOnField} must be a whole number from 0 (Sunday) to 6 (Saturday)`);
  }
  return {
    minimumWage: readDecimal(rules.minimumWage, fieldPath(field, 'minimumWage'), NOT_NEGATIVE),
    overtimeAfterHours: readDecimal(rules.overtimeAfterHours, fieldPath(field, 'overtimeAfterHours'), NOT_NEGATIVE),
    overtimeMultiplier: readDecimal(rules.overtimeMultiplier, fieldPath(field, 'overtimeMultiplier'), { min: '1' }),
    workweekStartsOn: startsOn as Weekday,
    commissionExemption: readBoolean(rules.commissionExemption, fieldPath(field, 'commissionExemption')),
  };
}

function readHours(value: unknown): HoursEntry[] {
  const perDay = new Map<number, Big>();
  return readArray(value, 'hours').map((raw, i) => {
    const field = fieldPath('hours', i);
    const entry = readObject(raw, field);
    const day = parseBusinessDate(entry.date, fieldPath(field, 'date'));
    const hoursField = fieldPath(field, 'hours');
    const hours = readDecimal(entry.hours, hoursField, NOT_NEGATIVE);
    // Several entries may share a date (split shifts), but no date holds more than 24 hours.
    const dayTotal = (perDay.get(day) ?? new Big(0)).plus(hours);
    if (dayTotal.gt(HOURS_IN_A_DAY)) throw invalid(hoursField, `${hoursField} brings ${String(entry.date)} above 24 hours`);
    perDay.set(day, dayTotal);
    return { day, hours };
  });
}

/** Checks a PayInput field by field; the first problem throws a DomainError naming its path. */
export function validatePayInput(input: unknown): ValidPayInput {
  const root = readObject(input, '');
  const plan = readObject(root.plan, 'plan');
  const tierMode = readChoice(plan.tierMode, TIER_MODES, 'plan.tierMode');
  const tiers = readTiers(plan.tiers);
  const productCharge = readProductCharge(plan.productCharge);
  const retailRate = readDecimal(plan.retailRate, 'plan.retailRate', RATE);
  const hourlyRate = readOptionalDecimal(plan.hourlyRate, 'plan.hourlyRate', '0', NOT_NEGATIVE);

  const serviceLines = readArray(root.serviceLines, 'serviceLines').map((raw, i) => {
    const field = fieldPath('serviceLines', i);
    const line = readObject(raw, field);
    readString(line.id, fieldPath(field, 'id'));
    parseBusinessDate(line.date, fieldPath(field, 'date'));
    return {
      price: readDecimal(line.price, fieldPath(field, 'price')),
      isColour: readBoolean(line.isColour, fieldPath(field, 'isColour')),
      productCost: readDecimal(line.productCost, fieldPath(field, 'productCost'), NOT_NEGATIVE),
      share: readOptionalDecimal(line.share, fieldPath(field, 'share'), '1', RATE),
    };
  });
  const chargeAdjustments = (root.productChargeAdjustments === undefined ? [] : readArray(root.productChargeAdjustments, 'productChargeAdjustments')).map((raw, i) => {
    const field = fieldPath('productChargeAdjustments', i);
    const adjustment = readObject(raw, field);
    readString(adjustment.id, fieldPath(field, 'id'));
    parseBusinessDate(adjustment.date, fieldPath(field, 'date'));
    return readDecimal(adjustment.amount, fieldPath(field, 'amount'));
  });
  const retailAmounts = readArray(root.retailLines, 'retailLines').map((raw, i) => {
    const field = fieldPath('retailLines', i);
    const line = readObject(raw, field);
    readString(line.id, fieldPath(field, 'id'));
    parseBusinessDate(line.date, fieldPath(field, 'date'));
    return readDecimal(line.amount, fieldPath(field, 'amount'));
  });
  const tipAmounts = readArray(root.tips, 'tips').map((raw, i) => {
    const field = fieldPath('tips', i);
    const tip = readObject(raw, field);
    parseBusinessDate(tip.date, fieldPath(field, 'date'));
    return readDecimal(tip.amount, fieldPath(field, 'amount'));
  });

  return {
    tierMode,
    tiers,
    productCharge,
    retailRate,
    hourlyRate,
    serviceLines,
    chargeAdjustments,
    retailAmounts,
    tipAmounts,
    hours: readHours(root.hours),
    wageRules: readWageRules(root.wageRules),
  };
}
