import type { ClientDetail } from '../api/client-queries';
import type { NewClient } from '../api/use-create-client';
import type { ClientChanges } from '../api/use-update-client';

/** Every field as the form holds it: text, with '' for "none". */
export type ClientFormValues = {
  firstName: string;
  lastName: string;
  homeBranchId: string;
  phone: string;
  email: string;
  lastPatchTestOn: string;
  allergyNotes: string;
  notes: string;
};
export type ClientField = keyof ClientFormValues;

// Form order, top to bottom, so the first refused field is the first one the eye meets.
export const clientFieldOrder: ClientField[] = ['firstName', 'lastName', 'phone', 'email', 'homeBranchId', 'lastPatchTestOn', 'allergyNotes', 'notes'];

export const isClientField = (field: string): field is ClientField => (clientFieldOrder as string[]).includes(field);

export function formValuesOf(client: ClientDetail | undefined, homeBranchId: string): ClientFormValues {
  return {
    firstName: client?.firstName ?? '',
    lastName: client?.lastName ?? '',
    homeBranchId: client?.homeBranchId ?? homeBranchId,
    phone: client?.phone ?? '',
    email: client?.email ?? '',
    lastPatchTestOn: client?.lastPatchTestOn ?? '',
    allergyNotes: client?.allergyNotes ?? '',
    notes: client?.notes ?? '',
  };
}

const orNull = (value: string): string | null => (value === '' ? null : value);

function tidy(values: ClientFormValues): ClientFormValues {
  const trimmed = { ...values };
  for (const field of clientFieldOrder) trimmed[field] = values[field].trim();
  return trimmed;
}

export function newClientOf(values: ClientFormValues): NewClient {
  const v = tidy(values);
  return {
    firstName: v.firstName,
    lastName: v.lastName,
    homeBranchId: v.homeBranchId,
    phone: orNull(v.phone),
    email: orNull(v.email),
    lastPatchTestOn: orNull(v.lastPatchTestOn),
    allergyNotes: v.allergyNotes,
    notes: v.notes,
  };
}

/** Only what was changed is sent, so the client's history records just that. */
export function changesOf(client: ClientDetail, values: ClientFormValues): ClientChanges {
  const before = formValuesOf(client, client.homeBranchId);
  const after = tidy(values);
  const changes: ClientChanges = {};
  for (const field of clientFieldOrder) {
    if (after[field] === before[field]) continue;
    if (field === 'phone' || field === 'email' || field === 'lastPatchTestOn') changes[field] = orNull(after[field]);
    else changes[field] = after[field];
  }
  return changes;
}
