import { Transform } from 'class-transformer';
import { ValidateIf } from 'class-validator';

// At least three digits among digits, spaces and + ( ) - . only.
export const PHONE = /^(?=(?:\D*\d){3})[0-9+ ().-]{3,30}$/;
export const PHONE_MESSAGE = 'phone must be up to 30 digits, spaces and + ( ) - . characters, with at least 3 digits';
export const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;
export const ISO_DATE_MESSAGE = 'lastPatchTestOn must be a calendar date written YYYY-MM-DD';

/** May be left out, but not sent as null (the column has no empty value). */
export const NotNull = () => ValidateIf((_object: object, value: unknown) => value !== undefined);

/** Trims text; a blank field clears the value. */
export const BlankAsNull = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? (value.trim() === '' ? null : value.trim()) : value));
