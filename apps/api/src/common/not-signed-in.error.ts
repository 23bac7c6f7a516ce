import { DomainError } from '@tressury/domain';

/** Missing, wrong or expired credentials: answered with 401 and never says which part was wrong. */
export class NotSignedInError extends DomainError {
  constructor(message: string) {
    super('auth.not_signed_in', message, 'invalid');
  }
}
