import { registerDecorator, type ValidationOptions } from 'class-validator';
import Big from 'big.js';

type DecimalRule = { min?: string; max?: string; scale: number };

const DECIMAL = /^-?\d{1,12}(\.\d+)?$/;

/** Money, rates and quantities travel as decimal strings ("7.25"), never JSON numbers. */
export function IsDecimalString(rule: DecimalRule, options?: ValidationOptions): PropertyDecorator {
  return (target, propertyName) => {
    registerDecorator({
      name: 'isDecimalString',
      target: target.constructor,
      propertyName: String(propertyName),
      options,
      validator: {
        validate(value: unknown) {
          if (typeof value !== 'string' || !DECIMAL.test(value)) return false;
          if ((value.split('.')[1]?.length ?? 0) > rule.scale) return false;
          const amount = new Big(value);
          if (rule.min !== undefined && amount.lt(rule.min)) return false;
          if (rule.max !== undefined && amount.gt(rule.max)) return false;
          return true;
        },
        defaultMessage(args) {
          const range = rule.min !== undefined && rule.max !== undefined ? ` from ${rule.min} to ${rule.max}` : '';
          return `${args?.property} must be a decimal number written as text${range}, with at most ${rule.scale} decimal places (e.g. "${rule.min ?? '0'}")`;
        },
      },
    });
  };
}
