import { DomainError } from '@tressury/domain';

export const branchNotFound = () => new DomainError('branch.not_found', 'No such branch.', 'not_found');
