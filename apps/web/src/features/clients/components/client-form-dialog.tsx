import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, TextArea } from '@blueprintjs/core';
import { type FormEvent, type ReactNode, useEffect, useRef, useState } from 'react';
import { generatePath, useNavigate } from 'react-router';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { businessDateIn } from '../../../lib/business-date';
import { routePaths } from '../../../lib/route-paths';
import { useSessionUser } from '../../../lib/session';
import { showToast } from '../../../lib/toaster';
import type { ClientDetail } from '../api/client-queries';
import { useCreateClient } from '../api/use-create-client';
import { useUpdateClient } from '../api/use-update-client';
import { fullName } from './client-names';
import { type ClientField, changesOf, clientFieldOrder, formValuesOf, isClientField, newClientOf } from './client-form-values';

type Problems = Partial<Record<ClientField, string>>;

const fieldId = (field: ClientField) => `client-${field}`;
const helpId = (field: ClientField) => `client-${field}-help`;

type Props = { isOpen: boolean; client?: ClientDetail; defaultBranchId?: string | null; onClose: () => void };

/** One form for a new client and for changing one; `client` given means editing it. */
export function ClientFormDialog({ isOpen, client, defaultBranchId, onClose }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={client ? `Edit ${fullName(client)}` : 'New client'} className="tr-clients-dialog">
      {isOpen && <ClientForm key={client?.id ?? 'new'} client={client} defaultBranchId={defaultBranchId ?? null} onDone={onClose} />}
    </Dialog>
  );
}

function ClientForm({ client, defaultBranchId, onDone }: { client?: ClientDetail; defaultBranchId: string | null; onDone: () => void }) {
  const branches = useSessionUser()?.branches ?? [];
  const create = useCreateClient();
  const update = useUpdateClient();
  const navigate = useNavigate();
  const [values, setValues] = useState(() => formValuesOf(client, defaultBranchId ?? branches[0]?.id ?? ''));
  const [problems, setProblems] = useState<Problems>({});
  const [refusal, setRefusal] = useState<string | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const justRefused = useRef(false);
  const pending = create.isPending || update.isPending;
  const homeBranch = branches.find((b) => b.id === values.homeBranchId);
  // A test cannot be recorded before it is done: no later than today at the client's branch.
  const latestTestDate = homeBranch ? businessDateIn(homeBranch.timeZone) : undefined;

  useEffect(() => {
    if (!justRefused.current) return;
    justRefused.current = false;
    const first = clientFieldOrder.find((name) => problems[name]);
    if (first) formRef.current?.querySelector<HTMLElement>(`#${fieldId(first)}`)?.focus();
  }, [problems]);

  const set = (field: ClientField, value: string) => {
    setValues((current) => ({ ...current, [field]: value }));
    setProblems((current) => {
      const rest = { ...current };
      delete rest[field];
      return rest;
    });
  };

  const refused = (error: unknown) => {
    const onFields: Problems = {};
    if (error instanceof ApiError) {
      for (const { field, message } of error.details) {
        if (isClientField(field)) onFields[field] = onFields[field] ? `${onFields[field]} ${message}` : message;
      }
    }
    if (Object.keys(onFields).length > 0) {
      justRefused.current = true;
      setProblems(onFields);
      setRefusal(null);
    } else setRefusal(errorMessage(error));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!client) {
      create.mutate(newClientOf(values), {
        onSuccess: (created) => {
          void showToast({ intent: Intent.SUCCESS, message: `${fullName(created)} added to the clients of ${created.homeBranchName}.` });
          onDone();
          void navigate(generatePath(routePaths.client, { clientId: created.id }));
        },
        onError: refused,
      });
      return;
    }
    const changes = changesOf(client, values);
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate(
      { id: client.id, changes },
      {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Changes to ${fullName(saved)} saved.` });
          onDone();
        },
        onError: refused,
      },
    );
  };

  const field = (name: ClientField, label: string, hint: ReactNode, control: (a11y: FieldA11y) => ReactNode) => (
    <FormGroup
      label={label}
      labelFor={fieldId(name)}
      intent={problems[name] ? Intent.DANGER : Intent.NONE}
      helperText={<span id={helpId(name)}>{problems[name] ?? hint}</span>}
    >
      {control({ id: fieldId(name), 'aria-describedby': helpId(name), 'aria-invalid': problems[name] ? true : undefined })}
    </FormGroup>
  );

  const text = (name: ClientField, extra?: { autoFocus?: boolean; type?: string; inputMode?: 'tel' | 'email'; max?: string }) => (a11y: FieldA11y) => (
    <InputGroup {...a11y} {...extra} intent={problems[name] ? Intent.DANGER : Intent.NONE} value={values[name]} onValueChange={(value) => set(name, value)} />
  );

  const longText = (name: 'allergyNotes' | 'notes') => (a11y: FieldA11y) => (
    <TextArea
      {...a11y}
      fill
      rows={2}
      intent={problems[name] ? Intent.DANGER : Intent.NONE}
      value={values[name]}
      onChange={(event) => set(name, event.currentTarget.value)}
    />
  );

  return (
    <form ref={formRef} onSubmit={submit} noValidate>
      <DialogBody>
        <div className="tr-clients-form-row">
          {field('firstName', 'First name', undefined, text('firstName', { autoFocus: true }))}
          {field('lastName', 'Last name', undefined, text('lastName'))}
        </div>
        <div className="tr-clients-form-row">
          {field('phone', 'Phone', 'Digits, spaces and + ( ) - . only.', text('phone', { type: 'tel', inputMode: 'tel' }))}
          {field('email', 'E-mail', undefined, text('email', { type: 'email', inputMode: 'email' }))}
        </div>
        <div className="tr-clients-form-row">
          {field('homeBranchId', 'Home branch', 'The branch that keeps this record.', (a11y) => (
            <HTMLSelect {...a11y} fill value={values.homeBranchId} onChange={(event) => set('homeBranchId', event.currentTarget.value)}>
              {branches.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.name}
                </option>
              ))}
            </HTMLSelect>
          ))}
          {field(
            'lastPatchTestOn',
            'Last patch test',
            'The day the skin test was done; leave empty when none is on record.',
            text('lastPatchTestOn', { type: 'date', max: latestTestDate }),
          )}
        </div>
        {field('allergyNotes', 'Allergy notes', 'Known allergies and sensitivities, shown to everyone who works with this client.', longText('allergyNotes'))}
        {field('notes', 'Notes', undefined, longText('notes'))}
        {refusal && (
          <Callout intent={Intent.DANGER} role="alert">
            {refusal}
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={pending} />
            <Button type="submit" intent={Intent.PRIMARY} loading={pending} text={client ? 'Save changes' : 'Add client'} />
          </>
        }
      />
    </form>
  );
}

type FieldA11y = { id: string; 'aria-describedby': string; 'aria-invalid': true | undefined };
