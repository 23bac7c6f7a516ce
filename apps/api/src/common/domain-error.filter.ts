import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import { DomainError, type DomainErrorKind } from '@tressury/domain';
import type { Response } from 'express';
import { CardProcessorUnavailableError } from '../card-processor/card-processor-errors.js';
import { NotSignedInError } from './not-signed-in.error.js';
import { ValidationFailedError } from './validation-failed.error.js';

const statusOfKind: Record<DomainErrorKind, number> = {
  invalid: HttpStatus.BAD_REQUEST,
  not_found: HttpStatus.NOT_FOUND,
  conflict: HttpStatus.CONFLICT,
  forbidden: HttpStatus.FORBIDDEN,
};

const codeOfStatus: Record<number, { code: string; message: string }> = {
  400: { code: 'request.invalid', message: 'The request could not be read.' },
  401: { code: 'auth.required', message: 'Sign in to continue.' },
  403: { code: 'auth.forbidden', message: 'Your role does not allow this.' },
  404: { code: 'not_found', message: 'Nothing was found at this address.' },
  413: { code: 'request.too_large', message: 'The request is too large.' },
  429: { code: 'request.too_many', message: 'Too many attempts; wait a minute and try again.' },
};

export type ErrorBody = { statusCode: number; code: string; message: string; details: { field: string; message: string }[] };

/** Maps coded domain errors (and Nest's own HTTP exceptions) to one error body: `{ statusCode, code, message, details }`. */
@Catch()
export class DomainErrorFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toBody(exception);
    response.status(body.statusCode).json(body);
  }

  private toBody(exception: unknown): ErrorBody {
    if (exception instanceof ValidationFailedError) {
      return { statusCode: 400, code: exception.code, message: exception.message, details: exception.problems };
    }
    if (exception instanceof CardProcessorUnavailableError) {
      this.logger.warn(exception.message);
      return {
        statusCode: 503,
        code: 'card_processor.unavailable',
        message: 'The card processor did not answer. Nothing is lost: try again with the same checkout, and a card is charged at most once.',
        details: [],
      };
    }
    if (exception instanceof NotSignedInError) {
      return { statusCode: 401, code: exception.code, message: exception.message, details: [] };
    }
    if (exception instanceof DomainError) {
      const details = exception.field ? [{ field: exception.field, message: exception.message }] : [];
      return { statusCode: statusOfKind[exception.kind], code: exception.code, message: exception.message, details };
    }
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const known = codeOfStatus[statusCode];
      const message = known?.message ?? exception.message;
      return { statusCode, code: known?.code ?? `http.${statusCode}`, message, details: [] };
    }
    this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    return { statusCode: 500, code: 'internal', message: 'Something went wrong on our side; nothing was saved.', details: [] };
  }
}
