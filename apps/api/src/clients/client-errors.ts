import { DomainError } from '@tressury/domain';

export const clientNotFound = () => new DomainError('client.not_found', 'No such client.', 'not_found');

export const clientBranchUnknown = () => new DomainError('client.unknown_branch', 'No such branch among yours.', 'invalid', 'homeBranchId');

export const patchTestInFuture = (date: string, today: string) =>
  new DomainError(
    'client.patch_test_in_future',
    `The patch test date ${date} is after today (${today}) at the client's branch; record a test once it has been done.`,
    'invalid',
    'lastPatchTestOn',
  );
