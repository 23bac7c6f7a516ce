import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, InputGroup, Intent } from '@blueprintjs/core';
import { serviceLinePrice } from '@tressury/domain';
import { type FormEvent, useState } from 'react';
import { showToast } from '../../../lib/toaster';
import type { Service, StaffMember } from '../api/picker-queries';
import type { ServiceLine } from '../api/ticket-queries';
import { type ServiceLineChanges, useUpdateServiceLine } from '../api/use-update-service-line';
import { levelPrice } from './add-service-form';
import { fieldProblems, leftoverProblem, type Problems } from './field-problems';
import { typedDecimal } from './figures';
import { StaffSelect } from './staff-select';

type Props = { ticketId: string; line: ServiceLine | null; services: Service[]; staff: StaffMember[]; onClose: () => void };

export function ServiceLineDialog({ line, onClose, ...rest }: Props) {
  return (
    <Dialog isOpen={line !== null} onClose={onClose} title={line ? `Change ${line.serviceName}` : ''} className="tr-line-dialog">
      {line && <ServiceLineForm key={line.id} line={line} onDone={onClose} {...rest} />}
    </Dialog>
  );
}

function ServiceLineForm({ ticketId, line, services, staff, onDone }: Omit<Props, 'line' | 'onClose'> & { line: ServiceLine; onDone: () => void }) {
  const update = useUpdateServiceLine(ticketId);
  const [staffId, setStaffId] = useState(line.staffId);
  const [discount, setDiscount] = useState(line.discount);
  const [assistantId, setAssistantId] = useState(line.assistantStaffId ?? '');
  const [share, setShare] = useState(line.assistantShare ?? '');
  const [problems, setProblems] = useState<Problems>({});
  const [refusal, setRefusal] = useState<string | null>(null);

  const service = services.find((s) => s.id === line.serviceId);
  const stylist = staff.find((s) => s.id === staffId);
  const listPrice = staffId === line.staffId ? line.listPrice : levelPrice(service, stylist);
  let priceText: string;
  if (listPrice === null) priceText = stylist ? `${line.serviceName} is not offered at ${stylist.levelName} level.` : '';
  else {
    const typed = typedDecimal(discount === '' ? '0' : discount);
    try {
      priceText = typed === null ? `List price ${listPrice}.` : `List price ${listPrice}; the client pays ${serviceLinePrice({ listPrice, discount: typed })}.`;
    } catch (error) {
      priceText = `List price ${listPrice}. ${error instanceof Error ? error.message.replace(/^discount/, 'The discount') : ''}`;
    }
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const changes: ServiceLineChanges = {};
    if (staffId !== line.staffId) changes.staffId = staffId;
    if (discount.trim() !== line.discount) changes.discount = discount.trim() || '0';
    if ((assistantId || null) !== line.assistantStaffId) changes.assistantStaffId = assistantId || null;
    const newShare = assistantId ? share.trim() : null;
    if (newShare !== line.assistantShare || changes.assistantStaffId !== undefined) changes.assistantShare = newShare;
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate(
      { lineId: line.id, changes },
      {
        onSuccess: () => {
          void showToast({ intent: Intent.SUCCESS, message: `${line.serviceName} changed.` });
          onDone();
        },
        onError: (error) => {
          setProblems(fieldProblems(error));
          setRefusal(leftoverProblem(error, ['staffId', 'discount', 'assistantStaffId', 'assistantShare']));
        },
      },
    );
  };

  return (
    <form onSubmit={submit} noValidate>
      <DialogBody>
        <FormGroup label="Stylist" labelFor="line-stylist" helperText={problems.staffId} intent={problems.staffId ? Intent.DANGER : Intent.NONE}>
          <StaffSelect id="line-stylist" staff={staff} value={staffId} onChange={setStaffId} emptyLabel="Choose a stylist" showLevel invalid={Boolean(problems.staffId)} />
        </FormGroup>
        <FormGroup label="Discount" labelFor="line-discount" helperText={problems.discount ?? priceText} intent={problems.discount ? Intent.DANGER : Intent.NONE}>
          <InputGroup id="line-discount" autoFocus inputMode="decimal" className="tr-figure-input" value={discount} onValueChange={setDiscount} />
        </FormGroup>
        <div className="tr-ticket-form-row">
          <FormGroup label="Assistant" labelFor="line-assistant" helperText={problems.assistantStaffId} intent={problems.assistantStaffId ? Intent.DANGER : Intent.NONE}>
            <StaffSelect id="line-assistant" staff={staff.filter((s) => s.id !== staffId)} value={assistantId} onChange={setAssistantId} emptyLabel="No assistant" />
          </FormGroup>
          <FormGroup
            label="Assistant's share"
            labelFor="line-share"
            helperText={problems.assistantShare ?? 'A fraction: 0.25 is a quarter.'}
            intent={problems.assistantShare ? Intent.DANGER : Intent.NONE}
          >
            <InputGroup id="line-share" inputMode="decimal" disabled={!assistantId} className="tr-figure-input" value={share} onValueChange={setShare} />
          </FormGroup>
        </div>
        {refusal && (
          <Callout intent={Intent.DANGER} role="alert">
            {refusal}
          </Callout>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={onDone} disabled={update.isPending} />
            <Button type="submit" intent={Intent.PRIMARY} loading={update.isPending} text="Save changes" />
          </>
        }
      />
    </form>
  );
}
