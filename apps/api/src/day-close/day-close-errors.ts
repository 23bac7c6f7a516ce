import { DomainError } from '@tressury/domain';

export const branchNotFound = () => new DomainError('branch.not_found', 'No such branch.', 'not_found', 'branchId');

export const cannotClose = (code: string, message: string, field?: string) => new DomainError(`day.${code}`, message, 'conflict', field);
