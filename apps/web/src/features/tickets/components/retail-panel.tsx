import { Button, FormGroup, H2, HTMLSelect, HTMLTable, InputGroup, Intent, Tag } from '@blueprintjs/core';
import { PlusIcon, TrashIcon } from '@blueprintjs/icons';
import { type FormEvent, useMemo, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { businessDateText } from '../../../lib/business-date';
import { showToast } from '../../../lib/toaster';
import type { Product, StaffMember } from '../api/picker-queries';
import type { Ticket } from '../api/ticket-queries';
import { useAddRetailLine } from '../api/use-add-retail-line';
import { useRemoveRetailLine } from '../api/use-remove-retail-line';
import { fieldProblems, leftoverProblem, type Problems } from './field-problems';
import { StaffSelect } from './staff-select';
import type { TicketPermissions } from './ticket-permissions';

type Props = { ticket: Ticket; products: Product[]; staff: StaffMember[]; can: TicketPermissions };

export function RetailPanel({ ticket, products, staff, can }: Props) {
  const remove = useRemoveRetailLine(ticket.id);
  const lines = ticket.retailLines;
  if (lines.length === 0 && !can.editable) return null;

  return (
    <section className="tr-panel tr-ticket-panel" aria-labelledby="ticket-retail">
      <H2 id="ticket-retail" className="tr-panel-title">
        Retail
      </H2>
      {lines.length === 0 ? (
        <p className="tr-muted">Nothing sold over the counter yet.</p>
      ) : (
        <HTMLTable compact className="tr-table" aria-label="Retail">
          <thead>
            <tr>
              <th scope="col">Product</th>
              <th scope="col" className="tr-figure">
                Qty
              </th>
              <th scope="col" className="tr-figure">
                Each
              </th>
              <th scope="col" className="tr-figure">
                Amount
              </th>
              <th scope="col" className="tr-figure">
                Tax
              </th>
              <th scope="col">Sold by</th>
              <th scope="col">
                <span className="tr-visually-hidden">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {lines.map((line) => (
              <tr key={line.id}>
                <td className="tr-row-head">
                  {line.productName}
                  {line.refundOfLineId && (
                    <Tag minimal intent={Intent.DANGER} className="tr-inline-tag">
                      Returned {businessDateText(line.bookedOn)}
                    </Tag>
                  )}
                </td>
                <td className="tr-figure">{line.quantity}</td>
                <td className="tr-figure">{line.unitPrice}</td>
                <td className="tr-figure">{line.amount}</td>
                <td className="tr-figure">{line.tax}</td>
                <td>{line.sellerName}</td>
                <td className="tr-row-actions">
                  {can.removesRetail(line) && (
                    <Button
                      size="small"
                      variant="minimal"
                      icon={<TrashIcon />}
                      aria-label={`Remove ${line.productName}`}
                      loading={remove.isPending && remove.variables === line.id}
                      onClick={() => remove.mutate(line.id, { onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }) })}
                    />
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      )}
      {can.editable && <AddRetailForm ticketId={ticket.id} products={products} staff={staff} ownStaffId={can.ownStaffId} />}
    </section>
  );
}

function AddRetailForm({ ticketId, products, staff, ownStaffId }: { ticketId: string; products: Product[]; staff: StaffMember[]; ownStaffId: string | null }) {
  const add = useAddRetailLine(ticketId);
  const retail = useMemo(() => products.filter((p) => p.kind === 'retail' && p.active), [products]);
  const [productId, setProductId] = useState('');
  const [quantity, setQuantity] = useState('1');
  const [sellerId, setSellerId] = useState(ownStaffId ?? '');
  const [unitPrice, setUnitPrice] = useState('');
  const [problems, setProblems] = useState<Problems>({});
  const product = retail.find((p) => p.id === productId);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const local: Problems = {};
    if (!productId) local.productId = 'Choose a product.';
    if (!/^[1-9]\d*$/.test(quantity.trim())) local.quantity = 'A whole number, 1 or more.';
    if (!sellerId) local.sellerStaffId = 'Who sold it?';
    if (Object.keys(local).length > 0) return setProblems(local);
    add.mutate(
      { productId, quantity: Number(quantity.trim()), sellerStaffId: sellerId, unitPrice: unitPrice.trim() || undefined },
      {
        onSuccess: () => {
          setProductId('');
          setQuantity('1');
          setUnitPrice('');
          setProblems({});
        },
        onError: (error) => {
          setProblems(fieldProblems(error));
          const elsewhere = leftoverProblem(error, ['productId', 'quantity', 'sellerStaffId', 'unitPrice']);
          if (elsewhere) void showToast({ intent: Intent.DANGER, message: elsewhere });
        },
      },
    );
  };

  return (
    <form className="tr-add-form" onSubmit={submit} noValidate aria-label="Add retail">
      <div className="tr-add-grid">
        <FormGroup className="tr-add-wide" label="Product" labelFor="add-retail-product" helperText={problems.productId} intent={problems.productId ? Intent.DANGER : Intent.NONE}>
          <HTMLSelect id="add-retail-product" fill value={productId} aria-invalid={problems.productId ? true : undefined} onChange={(event) => setProductId(event.currentTarget.value)}>
            <option value="">Choose a product</option>
            {retail.map((p) => (
              <option key={p.id} value={p.id}>
                {`${p.name} · ${p.retailPrice ?? ''}`}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        <FormGroup className="tr-add-tiny" label="Qty" labelFor="add-retail-quantity" helperText={problems.quantity} intent={problems.quantity ? Intent.DANGER : Intent.NONE}>
          <InputGroup id="add-retail-quantity" inputMode="numeric" className="tr-figure-input" value={quantity} onValueChange={setQuantity} />
        </FormGroup>
        <FormGroup className="tr-add-mid" label="Sold by" labelFor="add-retail-seller" helperText={problems.sellerStaffId} intent={problems.sellerStaffId ? Intent.DANGER : Intent.NONE}>
          <StaffSelect id="add-retail-seller" staff={staff} value={sellerId} onChange={setSellerId} emptyLabel="Choose who sold it" disabled={ownStaffId !== null} />
        </FormGroup>
        <FormGroup className="tr-add-narrow" label="Price each" labelFor="add-retail-price" helperText={problems.unitPrice} intent={problems.unitPrice ? Intent.DANGER : Intent.NONE}>
          <InputGroup
            id="add-retail-price"
            inputMode="decimal"
            className="tr-figure-input"
            placeholder={product?.retailPrice ?? 'Shelf price'}
            value={unitPrice}
            onValueChange={setUnitPrice}
          />
        </FormGroup>
        <div className="tr-add-submit">
          <Button type="submit" icon={<PlusIcon />} text="Add retail" loading={add.isPending} />
        </div>
      </div>
    </form>
  );
}
