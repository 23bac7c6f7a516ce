import { DomainError } from '@tressury/domain';

export const branchNotFound = () => new DomainError('branch.not_found', 'No such branch.', 'not_found');

export const branchNameTaken = (name: string) =>
  new DomainError('branch.name_taken', `A branch called "${name}" already exists in this organisation.`, 'conflict', 'name');
