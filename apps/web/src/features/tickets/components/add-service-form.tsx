import { Alert, Button, FormGroup, HTMLSelect, InputGroup, Intent } from '@blueprintjs/core';
import { PlusIcon, WarningSignIcon } from '@blueprintjs/icons';
import { serviceLinePrice } from '@tressury/domain';
import { type FormEvent, useMemo, useState } from 'react';
import { ApiError } from '../../../lib/api-error';
import { showToast } from '../../../lib/toaster';
import type { Service, StaffMember } from '../api/picker-queries';
import { type NewServiceLine, useAddServiceLine } from '../api/use-add-service-line';
import { fieldProblems, leftoverProblem, type Problems } from './field-problems';
import { typedDecimal } from './figures';
import { StaffSelect } from './staff-select';

type Props = {
  ticketId: string;
  services: Service[];
  staff: StaffMember[];
  /** A stylist adds only her own services: the stylist is fixed to her. */
  ownStaffId: string | null;
};

/** The price a stylist of this level charges for the service, or null when the level does not offer it. */
export function levelPrice(service: Service | undefined, stylist: StaffMember | undefined): string | null {
  if (!service || !stylist) return null;
  return service.prices.find((p) => p.levelId === stylist.levelId)?.price ?? null;
}

export function groupByCategory(services: Service[]): [string, Service[]][] {
  const groups = new Map<string, Service[]>();
  for (const service of services) groups.set(service.category, [...(groups.get(service.category) ?? []), service]);
  return [...groups];
}

const fields = ['serviceId', 'staffId', 'discount', 'assistantStaffId', 'assistantShare'] as const;

export function AddServiceForm({ ticketId, services, staff, ownStaffId }: Props) {
  const add = useAddServiceLine(ticketId);
  const [serviceId, setServiceId] = useState('');
  const [staffId, setStaffId] = useState(ownStaffId ?? '');
  const [discount, setDiscount] = useState('');
  const [assistantId, setAssistantId] = useState('');
  const [share, setShare] = useState('');
  const [problems, setProblems] = useState<Problems>({});
  const [caution, setCaution] = useState<{ message: string; body: NewServiceLine } | null>(null);

  const active = useMemo(() => services.filter((s) => s.active), [services]);
  const groups = useMemo(() => groupByCategory(active), [active]);
  const service = active.find((s) => s.id === serviceId);
  const stylist = staff.find((s) => s.id === staffId);
  const listPrice = levelPrice(service, stylist);
  const assistants = staff.filter((s) => s.id !== staffId);

  let priceText = 'Choose a service and a stylist to see the price.';
  let priceProblem = false;
  if (service && stylist) {
    if (listPrice === null) {
      priceText = `${service.name} is not offered at ${stylist.levelName} level.`;
      priceProblem = true;
    } else {
      const typed = discount.trim() === '' ? '0' : typedDecimal(discount);
      try {
        priceText =
          typed === null
            ? `${stylist.levelName} price ${listPrice}.`
            : typed === '0'
              ? `${stylist.levelName} price ${listPrice}.`
              : `${stylist.levelName} price ${listPrice}, ${serviceLinePrice({ listPrice, discount: typed })} after the discount.`;
      } catch (error) {
        priceText = `${stylist.levelName} price ${listPrice}. ${error instanceof Error ? error.message.replace(/^discount/, 'The discount') : ''}`;
        priceProblem = true;
      }
    }
  }

  const clear = (field: string) =>
    setProblems((current) => {
      const rest = { ...current };
      delete rest[field];
      return rest;
    });

  const send = (body: NewServiceLine) =>
    add.mutate(body, {
      onSuccess: () => {
        setCaution(null);
        setServiceId('');
        setDiscount('');
        setAssistantId('');
        setShare('');
        setProblems({});
        void showToast({ intent: Intent.SUCCESS, message: `${service?.name ?? 'Service'} added.` });
      },
      onError: (error) => {
        if (error instanceof ApiError && error.code === 'ticket.patch_test_caution') {
          setCaution({ message: error.message, body });
          return;
        }
        setCaution(null);
        setProblems(fieldProblems(error));
        const elsewhere = leftoverProblem(error, fields);
        if (elsewhere) void showToast({ intent: Intent.DANGER, message: elsewhere });
      },
    });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const local: Problems = {};
    if (!serviceId) local.serviceId = 'Choose a service.';
    if (!staffId) local.staffId = 'Choose the stylist.';
    if (assistantId && share.trim() === '') local.assistantShare = "Give the assistant's share, such as 0.25.";
    if (Object.keys(local).length > 0) return setProblems(local);
    send({
      serviceId,
      staffId,
      discount: discount.trim() || undefined,
      assistantStaffId: assistantId || undefined,
      assistantShare: assistantId ? share.trim() : undefined,
    });
  };

  return (
    <form className="tr-add-form" onSubmit={submit} noValidate aria-label="Add a service">
      <div className="tr-add-grid">
        <FormGroup className="tr-add-wide" label="Service" labelFor="add-service" helperText={problems.serviceId} intent={problems.serviceId ? Intent.DANGER : Intent.NONE}>
          <HTMLSelect
            id="add-service"
            fill
            value={serviceId}
            aria-invalid={problems.serviceId ? true : undefined}
            className={problems.serviceId ? 'tr-invalid-select' : undefined}
            onChange={(event) => {
              setServiceId(event.currentTarget.value);
              clear('serviceId');
            }}
          >
            <option value="">Choose a service</option>
            {groups.map(([category, list]) => (
              <optgroup key={category} label={category}>
                {list.map((s) => (
                  <option key={s.id} value={s.id}>
                    {s.isColour ? `${s.name} (colour)` : s.name}
                  </option>
                ))}
              </optgroup>
            ))}
          </HTMLSelect>
        </FormGroup>
        <FormGroup className="tr-add-wide" label="Stylist" labelFor="add-service-stylist" helperText={problems.staffId} intent={problems.staffId ? Intent.DANGER : Intent.NONE}>
          <StaffSelect
            id="add-service-stylist"
            staff={staff}
            value={staffId}
            showLevel
            disabled={ownStaffId !== null}
            invalid={Boolean(problems.staffId)}
            emptyLabel="Choose a stylist"
            onChange={(value) => {
              setStaffId(value);
              clear('staffId');
            }}
          />
        </FormGroup>
        <FormGroup className="tr-add-narrow" label="Discount" labelFor="add-service-discount" helperText={problems.discount} intent={problems.discount ? Intent.DANGER : Intent.NONE}>
          <InputGroup
            id="add-service-discount"
            inputMode="decimal"
            placeholder="0.00"
            className="tr-figure-input"
            value={discount}
            onValueChange={(value) => {
              setDiscount(value);
              clear('discount');
            }}
          />
        </FormGroup>
        {ownStaffId === null && (
          <>
            <FormGroup className="tr-add-mid" label="Assistant" labelFor="add-service-assistant" helperText={problems.assistantStaffId} intent={problems.assistantStaffId ? Intent.DANGER : Intent.NONE}>
              <StaffSelect
                id="add-service-assistant"
                staff={assistants}
                value={assistantId}
                emptyLabel="No assistant"
                onChange={(value) => {
                  setAssistantId(value);
                  clear('assistantStaffId');
                }}
              />
            </FormGroup>
            <FormGroup
              className="tr-add-narrow"
              label="Their share"
              labelFor="add-service-share"
              helperText={problems.assistantShare ?? '0.25 is a quarter'}
              intent={problems.assistantShare ? Intent.DANGER : Intent.NONE}
            >
              <InputGroup
                id="add-service-share"
                inputMode="decimal"
                disabled={!assistantId}
                className="tr-figure-input"
                value={share}
                onValueChange={(value) => {
                  setShare(value);
                  clear('assistantShare');
                }}
              />
            </FormGroup>
          </>
        )}
        <div className="tr-add-submit">
          <Button type="submit" icon={<PlusIcon />} text="Add service" loading={add.isPending && !caution} disabled={priceProblem} />
        </div>
      </div>
      <p className={priceProblem ? 'tr-field-problem' : 'tr-muted tr-price-line'} aria-live="polite">
        {priceText}
      </p>
      <Alert
        isOpen={caution !== null}
        intent={Intent.WARNING}
        icon={<WarningSignIcon />}
        cancelButtonText="Not now"
        confirmButtonText="Go ahead with colour"
        loading={add.isPending}
        canEscapeKeyCancel
        onCancel={() => setCaution(null)}
        onConfirm={() => caution && send({ ...caution.body, acknowledgePatchTest: true })}
      >
        <p className="tr-alert-title">Patch test</p>
        <p>{caution?.message}</p>
      </Alert>
    </form>
  );
}
