import { DomainError } from '@tressury/domain';

export const organisationNotFound = () => new DomainError('organisation.not_found', 'No such organisation.', 'not_found');
