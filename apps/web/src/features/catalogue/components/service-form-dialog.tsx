import { Button, Callout, Checkbox, Dialog, DialogBody, DialogFooter, FormGroup, InputGroup, Intent, Switch } from '@blueprintjs/core';
import { type FormEvent, useMemo, useState } from 'react';
import { showToast } from '../../../lib/toaster';
import type { Level, Service } from '../api/catalogue-queries';
import { useCreateService } from '../api/use-create-service';
import { type ServiceChanges, useUpdateService } from '../api/use-update-service';
import { Field, useFormProblems } from './form-problems';

type Props = { isOpen: boolean; service?: Service; levels: Level[]; categories: string[]; onClose: () => void };

export function ServiceFormDialog({ isOpen, service, levels, categories, onClose }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={service ? `Edit ${service.name}` : 'New service'} className="tr-catalogue-dialog">
      {isOpen && <ServiceForm key={service?.id ?? 'new'} service={service} levels={levels} categories={categories} onDone={onClose} />}
    </Dialog>
  );
}

type PriceField = `price:${string}`;
type ServiceField = 'name' | 'category' | 'durationMinutes' | 'isColour' | 'active' | 'prices' | PriceField;

const idOf = (field: ServiceField) => `service-${field.replace(':', '-')}`;
const priceField = (levelId: string): PriceField => `price:${levelId}`;

function ServiceForm({ service, levels, categories, onDone }: { service?: Service; levels: Level[]; categories: string[]; onDone: () => void }) {
  const create = useCreateService();
  const update = useUpdateService();
  const order = useMemo<ServiceField[]>(() => ['name', 'category', 'durationMinutes', ...levels.map((l) => priceField(l.id)), 'prices'], [levels]);
  const { problems, refusal, formRef, clear, refused } = useFormProblems(order, idOf);
  const [name, setName] = useState(service?.name ?? '');
  const [category, setCategory] = useState(service?.category ?? '');
  const [duration, setDuration] = useState(service ? String(service.durationMinutes) : '');
  const [isColour, setIsColour] = useState(service?.isColour ?? false);
  const [active, setActive] = useState(service?.active ?? true);
  const [prices, setPrices] = useState<Record<string, string>>(() => Object.fromEntries((service?.prices ?? []).map((p) => [p.levelId, p.price])));
  const pending = create.isPending || update.isPending;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    // Levels in rank order with a price typed; an empty box means the level does not offer the service.
    const sentPrices = levels.flatMap((l) => (prices[l.id]?.trim() ? [{ levelId: l.id, price: (prices[l.id] ?? '').trim() }] : []));
    const fieldOf = (field: string): ServiceField | null => {
      const price = /^prices\[(\d+)\]/.exec(field);
      if (price) {
        const sent = sentPrices[Number(price[1])];
        return sent ? priceField(sent.levelId) : 'prices';
      }
      return (['name', 'category', 'durationMinutes', 'prices'] as const).find((f) => f === field) ?? null;
    };
    const onError = (error: unknown) => refused(error, fieldOf);
    const values = { name: name.trim(), category: category.trim(), durationMinutes: Number(duration), isColour, prices: sentPrices };
    if (!service) {
      create.mutate(values, {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `${saved.name} added to the menu.` });
          onDone();
        },
        onError,
      });
      return;
    }
    const changes: ServiceChanges = {};
    if (values.name !== service.name) changes.name = values.name;
    if (values.category !== service.category) changes.category = values.category;
    if (values.durationMinutes !== service.durationMinutes) changes.durationMinutes = values.durationMinutes;
    if (isColour !== service.isColour) changes.isColour = isColour;
    if (active !== service.active) changes.active = active;
    const before = service.prices.map((p) => `${p.levelId}=${p.price}`).join();
    if (sentPrices.map((p) => `${p.levelId}=${p.price}`).join() !== before) changes.prices = sentPrices;
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate(
      { id: service.id, changes },
      {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Changes to ${saved.name} saved.` });
          onDone();
        },
        onError,
      },
    );
  };

  const text = (field: ServiceField, value: string, onChange: (value: string) => void, extra?: { autoFocus?: boolean; inputMode?: 'numeric' | 'decimal'; list?: string }) => (
    <Field id={idOf(field)} label={labels[field as keyof typeof labels]} hint={hints[field as keyof typeof hints]} problem={problems[field]}>
      {(a11y) => (
        <InputGroup
          {...a11y}
          {...extra}
          intent={problems[field] ? Intent.DANGER : Intent.NONE}
          value={value}
          onValueChange={(next) => {
            onChange(next);
            clear(field);
          }}
        />
      )}
    </Field>
  );

  return (
    <form ref={formRef} onSubmit={submit} noValidate>
      <DialogBody>
        {text('name', name, setName, { autoFocus: true })}
        <div className="tr-catalogue-form-row">
          {text('category', category, setCategory, { list: 'service-categories' })}
          {text('durationMinutes', duration, setDuration, { inputMode: 'numeric' })}
        </div>
        <datalist id="service-categories">
          {categories.map((c) => (
            <option key={c} value={c} />
          ))}
        </datalist>
        <Checkbox
          className="tr-catalogue-check"
          label="Colour service: needs a bowl (or a reason for none) before the ticket closes"
          checked={isColour}
          onChange={(event) => setIsColour(event.currentTarget.checked)}
        />
        <FormGroup label="Price by stylist level" helperText={problems.prices ?? 'Leave a level empty when it does not offer this service.'} intent={problems.prices ? Intent.DANGER : Intent.NONE}>
          <div className="tr-catalogue-price-grid" id={idOf('prices')} tabIndex={-1}>
            {levels.map((level) => {
              const field = priceField(level.id);
              return (
                <Field key={level.id} className="tr-catalogue-price-field" id={idOf(field)} label={level.name} problem={problems[field]}>
                  {(a11y) => (
                    <InputGroup
                      {...a11y}
                      inputMode="decimal"
                      className="tr-catalogue-figure-input"
                      intent={problems[field] ? Intent.DANGER : Intent.NONE}
                      value={prices[level.id] ?? ''}
                      onValueChange={(value) => {
                        setPrices((current) => ({ ...current, [level.id]: value }));
                        clear(field);
                      }}
                    />
                  )}
                </Field>
              );
            })}
          </div>
        </FormGroup>
        {service && (
          <FormGroup helperText="A service taken off the menu stays on old tickets but is not offered on new ones.">
            <Switch className="tr-catalogue-check" label="On the menu" checked={active} onChange={(event) => setActive(event.currentTarget.checked)} />
          </FormGroup>
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
            <Button type="submit" intent={Intent.PRIMARY} loading={pending} text={service ? 'Save changes' : 'Add service'} />
          </>
        }
      />
    </form>
  );
}

const labels = { name: 'Name', category: 'Category', durationMinutes: 'Duration (minutes)' };
const hints = { name: 'Unique on the menu.', category: 'Your own grouping, such as Cuts or Colour.', durationMinutes: 'Time booked, 1 to 720.' };
