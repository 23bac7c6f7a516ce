export type DomainErrorKind = 'invalid' | 'not_found' | 'conflict' | 'forbidden';

export class DomainError extends Error {
  constructor(readonly code: string, message: string, readonly kind: DomainErrorKind = 'invalid', readonly field?: string) { super(message); this.name = 'DomainError'; }
}
