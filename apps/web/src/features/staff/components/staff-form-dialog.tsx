import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, Switch } from '@blueprintjs/core';
import { type FormEvent, type ReactNode, useEffect, useRef, useState } from 'react';
import { ApiError, errorMessage } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { Level, StaffMember } from '../api/staff-queries';
import { type NewStaffMember, useCreateStaff } from '../api/use-create-staff';
import { type StaffChanges, useUpdateStaff } from '../api/use-update-staff';
import type { StaffPermissions } from './staff-permissions';

type StaffField = 'displayName' | 'email' | 'levelId' | 'homeBranchId' | 'hourlyRate';
const order: StaffField[] = ['displayName', 'email', 'levelId', 'homeBranchId', 'hourlyRate'];
const isStaffField = (field: string): field is StaffField => (order as string[]).includes(field);
const fieldId = (field: StaffField) => `staff-${field}`;

type Branch = { id: string; name: string };
type Props = {
  isOpen: boolean;
  member?: StaffMember;
  levels: Level[];
  branches: Branch[];
  defaultBranchId: string | null;
  permissions: StaffPermissions;
  onClose: () => void;
};

/** One form for a new staff member and for changing one; `member` given means editing them. */
export function StaffFormDialog({ isOpen, member, onClose, ...rest }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={member ? `Edit ${member.displayName}` : 'New staff member'} className="tr-people-dialog">
      {isOpen && <StaffForm key={member?.id ?? 'new'} member={member} onDone={onClose} {...rest} />}
    </Dialog>
  );
}

type Values = { displayName: string; email: string; levelId: string; homeBranchId: string; hourlyRate: string; active: boolean };

function StaffForm({ member, levels, branches, defaultBranchId, permissions, onDone }: Omit<Props, 'isOpen' | 'onClose'> & { onDone: () => void }) {
  const create = useCreateStaff();
  const update = useUpdateStaff();
  // A staff member's home branch may only be one where this person runs the staff.
  const homes = branches.filter((b) => (member ? permissions.edits(b.id) : permissions.hiresAt(b.id)));
  const [values, setValues] = useState<Values>(() => ({
    displayName: member?.displayName ?? '',
    email: member?.email ?? '',
    levelId: member?.levelId ?? levels[0]?.id ?? '',
    homeBranchId: member?.homeBranchId ?? (homes.some((b) => b.id === defaultBranchId) ? (defaultBranchId ?? '') : (homes[0]?.id ?? '')),
    hourlyRate: member?.hourlyRate ?? '',
    active: member?.active ?? true,
  }));
  const [problems, setProblems] = useState<Partial<Record<StaffField, string>>>({});
  const [refusal, setRefusal] = useState<string | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const justRefused = useRef(false);
  const pending = create.isPending || update.isPending;
  const setsPay = permissions.setsPay(values.homeBranchId, member?.id);

  useEffect(() => {
    if (!justRefused.current) return;
    justRefused.current = false;
    const first = order.find((name) => problems[name]);
    if (first) formRef.current?.querySelector<HTMLElement>(`#${fieldId(first)}`)?.focus();
  }, [problems]);

  const set = <F extends keyof Values>(field: F, value: Values[F]) => {
    setValues((current) => ({ ...current, [field]: value }));
    setProblems((current) => {
      const rest = { ...current };
      delete rest[field as StaffField];
      return rest;
    });
  };

  const refused = (error: unknown) => {
    const onFields: Partial<Record<StaffField, string>> = {};
    if (error instanceof ApiError) {
      for (const { field, message } of error.details) if (isStaffField(field)) onFields[field] = onFields[field] ? `${onFields[field]} ${message}` : message;
    }
    if (Object.keys(onFields).length > 0) {
      justRefused.current = true;
      setProblems(onFields);
      setRefusal(null);
    } else setRefusal(errorMessage(error));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const sent: NewStaffMember = {
      displayName: values.displayName.trim(),
      email: values.email.trim() || null,
      levelId: values.levelId,
      homeBranchId: values.homeBranchId,
      ...(setsPay ? { hourlyRate: values.hourlyRate.trim() || null } : {}),
    };
    if (!member) {
      create.mutate(sent, {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `${saved.displayName} added at ${saved.homeBranchName}.` });
          onDone();
        },
        onError: refused,
      });
      return;
    }
    const changes: StaffChanges = {};
    if (sent.displayName !== member.displayName) changes.displayName = sent.displayName;
    if (sent.email !== member.email) changes.email = sent.email;
    if (sent.levelId !== member.levelId) changes.levelId = sent.levelId;
    if (sent.homeBranchId !== member.homeBranchId) changes.homeBranchId = sent.homeBranchId;
    if (setsPay && sent.hourlyRate !== (member.hourlyRate ?? null)) changes.hourlyRate = sent.hourlyRate;
    if (values.active !== member.active) changes.active = values.active;
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate(
      { id: member.id, changes },
      {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Changes to ${saved.displayName} saved.` });
          onDone();
        },
        onError: refused,
      },
    );
  };

  const field = (name: StaffField, label: string, hint: ReactNode, control: (a11y: FieldA11y) => ReactNode) => (
    <FormGroup label={label} labelFor={fieldId(name)} intent={problems[name] ? Intent.DANGER : Intent.NONE} helperText={<span id={`${fieldId(name)}-help`}>{problems[name] ?? hint}</span>}>
      {control({ id: fieldId(name), 'aria-describedby': `${fieldId(name)}-help`, 'aria-invalid': problems[name] ? true : undefined })}
    </FormGroup>
  );

  const text = (name: 'displayName' | 'email' | 'hourlyRate', extra?: { autoFocus?: boolean; type?: string; inputMode?: 'decimal' | 'email' }) => (a11y: FieldA11y) => (
    <InputGroup {...a11y} {...extra} intent={problems[name] ? Intent.DANGER : Intent.NONE} value={values[name]} onValueChange={(value) => set(name, value)} />
  );

  return (
    <form ref={formRef} onSubmit={submit} noValidate>
      <DialogBody>
        {field('displayName', 'Name', 'As shown on tickets and statements.', text('displayName', { autoFocus: true }))}
        {field('email', 'E-mail', 'Optional; for contact only.', text('email', { type: 'email', inputMode: 'email' }))}
        <div className="tr-people-form-row">
          {field('levelId', 'Level', 'Sets the menu price of their services.', (a11y) => (
            <HTMLSelect {...a11y} fill value={values.levelId} onChange={(event) => set('levelId', event.currentTarget.value)}>
              {levels.map((level) => (
                <option key={level.id} value={level.id}>
                  {level.name}
                </option>
              ))}
            </HTMLSelect>
          ))}
          {field('homeBranchId', 'Home branch', undefined, (a11y) => (
            <HTMLSelect {...a11y} fill value={values.homeBranchId} onChange={(event) => set('homeBranchId', event.currentTarget.value)}>
              {homes.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.name}
                </option>
              ))}
            </HTMLSelect>
          ))}
        </div>
        {setsPay ? (
          field('hourlyRate', 'Hourly rate', 'Paid on top of commission; leave empty for none. A pay figure: seen only by those allowed.', text('hourlyRate', { inputMode: 'decimal' }))
        ) : (
          member?.hourlyRate !== undefined && (
            <p className="tr-people-sign-in">
              <span className="tr-muted">Hourly rate:</span> {member.hourlyRate ?? 'none'} <span className="tr-muted">(pay figures are changed by the owner)</span>
            </p>
          )
        )}
        {member && (
          <>
            <p className="tr-people-sign-in">
              <span className="tr-muted">Sign-in:</span> {member.userId ? 'linked to their own sign-in' : 'none linked'}
            </p>
            <FormGroup helperText="Someone who has left is kept, never deleted, so their tickets and pay history stay.">
              <Switch className="tr-people-check" label="Works here" checked={values.active} onChange={(event) => set('active', event.currentTarget.checked)} />
            </FormGroup>
          </>
        )}
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
            <Button type="submit" intent={Intent.PRIMARY} loading={pending} text={member ? 'Save changes' : 'Add staff member'} />
          </>
        }
      />
    </form>
  );
}

type FieldA11y = { id: string; 'aria-describedby': string; 'aria-invalid': true | undefined };
