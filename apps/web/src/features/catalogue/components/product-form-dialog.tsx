import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, HTMLSelect, InputGroup, Intent, Switch, Tag } from '@blueprintjs/core';
import { type FormEvent, useState } from 'react';
import { showToast } from '../../../lib/toaster';
import type { Product } from '../api/catalogue-queries';
import { useCreateProduct } from '../api/use-create-product';
import { useUpdateProduct } from '../api/use-update-product';
import { APPROXIMATE_COST_NOTE, containerUnits, isVolumeUnit, productKinds } from './catalogue-labels';
import { Field, type FieldA11y, useFormProblems } from './form-problems';
import {
  type ProductField,
  type ProductFormValues,
  changesOf,
  formValuesOf,
  isProductField,
  newProductOf,
  previewCostPerGram,
  productFieldOrder,
} from './product-form-values';

const idOf = (field: ProductField) => `product-${field}`;
const fieldOf = (field: string): ProductField | null => (isProductField(field) ? field : null);

type Props = { isOpen: boolean; product?: Product; onClose: () => void };

export function ProductFormDialog({ isOpen, product, onClose }: Props) {
  return (
    <Dialog isOpen={isOpen} onClose={onClose} title={product ? `Edit ${product.name}` : 'New product'} className="tr-catalogue-dialog">
      {isOpen && <ProductForm key={product?.id ?? 'new'} product={product} onDone={onClose} />}
    </Dialog>
  );
}

function ProductForm({ product, onDone }: { product?: Product; onDone: () => void }) {
  const create = useCreateProduct();
  const update = useUpdateProduct();
  const { problems, refusal, formRef, clear, refused } = useFormProblems(productFieldOrder, idOf);
  const [values, setValues] = useState(() => formValuesOf(product));
  const pending = create.isPending || update.isPending;
  const cost = previewCostPerGram(values);

  const set = <F extends keyof ProductFormValues>(field: F, value: ProductFormValues[F]) => {
    setValues((current) => ({ ...current, [field]: value }));
    if (field !== 'active') clear(field as ProductField);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const onError = (error: unknown) => refused(error, fieldOf);
    if (!product) {
      create.mutate(newProductOf(values), {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `${saved.name} added to the products.` });
          onDone();
        },
        onError,
      });
      return;
    }
    const changes = changesOf(product, values);
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate(
      { id: product.id, changes },
      {
        onSuccess: (saved) => {
          void showToast({ intent: Intent.SUCCESS, message: `Changes to ${saved.name} saved.` });
          onDone();
        },
        onError,
      },
    );
  };

  const text = (field: ProductField, label: string, hint?: string, extra?: { autoFocus?: boolean; inputMode?: 'decimal' }) => (
    <Field id={idOf(field)} label={label} hint={hint} problem={problems[field]}>
      {(a11y: FieldA11y) => (
        <InputGroup
          {...a11y}
          {...extra}
          intent={problems[field] ? Intent.DANGER : Intent.NONE}
          value={values[field]}
          onValueChange={(value) => set(field, value)}
        />
      )}
    </Field>
  );

  return (
    <form ref={formRef} onSubmit={submit} noValidate>
      <DialogBody>
        <div className="tr-catalogue-form-row tr-catalogue-form-row-code">
          {text('code', 'Code', 'Your own code, unique in the business.', { autoFocus: true })}
          {text('name', 'Name')}
        </div>
        <div className="tr-catalogue-form-row">
          <Field id={idOf('kind')} label="Kind" problem={problems.kind}>
            {(a11y) => (
              <HTMLSelect {...a11y} fill value={values.kind} onChange={(event) => set('kind', event.currentTarget.value as ProductFormValues['kind'])}>
                {productKinds.map(({ kind, label }) => (
                  <option key={kind} value={kind}>
                    {label}
                  </option>
                ))}
              </HTMLSelect>
            )}
          </Field>
          {values.kind === 'developer' ? (
            text('developerVolume', 'Developer volume', '10, 15, 20, 25, 30 or 40 are the usual strengths.', { inputMode: 'decimal' })
          ) : (
            <div />
          )}
        </div>
        <div className="tr-catalogue-form-row">
          {text('containerSize', 'Container size', 'How much one container holds.', { inputMode: 'decimal' })}
          <Field id={idOf('containerUnit')} label="Unit" problem={problems.containerUnit}>
            {(a11y) => (
              <HTMLSelect {...a11y} fill value={values.containerUnit} onChange={(event) => set('containerUnit', event.currentTarget.value as ProductFormValues['containerUnit'])}>
                {containerUnits.map(({ unit, label }) => (
                  <option key={unit} value={unit}>
                    {label}
                  </option>
                ))}
              </HTMLSelect>
            )}
          </Field>
        </div>
        <div className="tr-catalogue-form-row">
          {text('containerCost', 'Container cost', 'What the salon pays for one container.', { inputMode: 'decimal' })}
          {isVolumeUnit(values.containerUnit) ? (
            text('densityGramsPerMl', 'Density (g per mL)', 'From the safety data sheet; without it 1 g per mL is assumed.', { inputMode: 'decimal' })
          ) : (
            <div />
          )}
        </div>
        <div className="tr-catalogue-form-row">
          {text('retailPrice', 'Retail price', values.kind === 'retail' ? 'Shelf price; needed for a retail product.' : 'Only if it is also sold over the counter.', {
            inputMode: 'decimal',
          })}
          <FormGroup label="Cost per gram" helperText={cost?.approximate ? APPROXIMATE_COST_NOTE : 'Worked out from the container, as the server will.'}>
            <output className="tr-catalogue-cost-preview" aria-live="polite">
              {cost ? cost.costPerGram : '—'}
              {cost?.approximate && (
                <Tag minimal intent={Intent.WARNING}>
                  approx.
                </Tag>
              )}
            </output>
          </FormGroup>
        </div>
        {product && (
          <FormGroup helperText="A withdrawn product stays on old tickets but is not offered for new bowls or sales.">
            <Switch className="tr-catalogue-check" label="In use" checked={values.active} onChange={(event) => set('active', event.currentTarget.checked)} />
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
            <Button type="submit" intent={Intent.PRIMARY} loading={pending} text={product ? 'Save changes' : 'Add product'} />
          </>
        }
      />
    </form>
  );
}
