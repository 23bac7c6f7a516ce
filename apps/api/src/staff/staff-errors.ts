import { DomainError } from '@tressury/domain';

export const staffNotFound = () => new DomainError('staff.not_found', 'No such staff member.', 'not_found');

export const userAlreadyLinked = () =>
  new DomainError('staff.user_already_linked', 'That sign-in already belongs to another staff member; unlink it there first.', 'conflict', 'userId');
