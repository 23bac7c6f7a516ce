import { ParseUUIDPipe } from '@nestjs/common';
import { ValidationFailedError } from './validation-failed.error.js';

/** A path id that is not a UUID is a 400 naming the parameter, not a lookup. */
export const ParseId = (field = 'id') =>
  new ParseUUIDPipe({ exceptionFactory: () => new ValidationFailedError([{ field, message: `${field} must be a UUID` }]) });
