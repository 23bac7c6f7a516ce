import { Button, H2, HTMLTable, Intent, Tag } from '@blueprintjs/core';
import { EditIcon, TrashIcon } from '@blueprintjs/icons';
import { Fragment, useState } from 'react';
import { errorMessage } from '../../../lib/api-error';
import { businessDateText } from '../../../lib/business-date';
import { showToast } from '../../../lib/toaster';
import type { Product, Service, StaffMember } from '../api/picker-queries';
import type { ServiceLine, Ticket } from '../api/ticket-queries';
import { useRemoveServiceLine } from '../api/use-remove-service-line';
import { AddServiceForm } from './add-service-form';
import { BowlEditor } from './bowl-editor';
import { LineBowls } from './line-bowls';
import { ServiceLineDialog } from './service-line-dialog';
import type { TicketPermissions } from './ticket-permissions';

type Props = {
  ticket: Ticket;
  services: Service[];
  products: Product[];
  staff: StaffMember[];
  can: TicketPermissions;
  patchTestNote: string;
};

const shareText = (share: string | null) => (share === null ? '' : ` (${share})`);

export function ServiceLinesPanel({ ticket, services, products, staff, can, patchTestNote }: Props) {
  const remove = useRemoveServiceLine(ticket.id);
  const [editing, setEditing] = useState<ServiceLine | null>(null);
  const [bowlFor, setBowlFor] = useState<ServiceLine | null>(null);
  const lines = ticket.serviceLines;

  return (
    <section className="tr-panel tr-ticket-panel" aria-labelledby="ticket-services">
      <H2 id="ticket-services" className="tr-panel-title">
        Services
      </H2>
      {lines.length === 0 ? (
        <p className="tr-muted">No services yet.</p>
      ) : (
        <HTMLTable compact className="tr-table tr-lines" aria-label="Services">
          <thead>
            <tr>
              <th scope="col">Service</th>
              <th scope="col">Stylist</th>
              <th scope="col">Assistant</th>
              <th scope="col" className="tr-figure">
                List
              </th>
              <th scope="col" className="tr-figure">
                Discount
              </th>
              <th scope="col" className="tr-figure">
                Price
              </th>
              <th scope="col">
                <span className="tr-visually-hidden">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {lines.map((line) => (
              <Fragment key={line.id}>
                <tr className={line.refundOfLineId ? 'tr-refund-row' : undefined}>
                  <td className="tr-row-head">
                    {line.serviceName}
                    {line.isColour && (
                      <Tag minimal className="tr-inline-tag">
                        Colour
                      </Tag>
                    )}
                    {line.refundOfLineId && (
                      <Tag minimal intent={Intent.DANGER} className="tr-inline-tag">
                        Refunded {businessDateText(line.bookedOn)}
                      </Tag>
                    )}
                  </td>
                  <td className="tr-nowrap">{line.staffName}</td>
                  <td>{line.assistantName ? `${line.assistantName}${shareText(line.assistantShare)}` : <span className="tr-muted">—</span>}</td>
                  <td className="tr-figure">{line.listPrice}</td>
                  <td className="tr-figure">{line.discount}</td>
                  <td className="tr-figure">{line.price}</td>
                  <td className="tr-row-actions">
                    {can.deskWork && !line.refundOfLineId && (
                      <>
                        <Button size="small" variant="minimal" icon={<EditIcon />} aria-label={`Change ${line.serviceName}`} onClick={() => setEditing(line)} />
                        <Button
                          size="small"
                          variant="minimal"
                          icon={<TrashIcon />}
                          aria-label={`Remove ${line.serviceName}`}
                          loading={remove.isPending && remove.variables === line.id}
                          onClick={() => remove.mutate(line.id, { onError: (error) => void showToast({ intent: Intent.DANGER, message: errorMessage(error) }) })}
                        />
                      </>
                    )}
                  </td>
                </tr>
                {line.isColour && !line.refundOfLineId && (
                  <tr className="tr-bowls-row">
                    <td colSpan={7}>
                      <LineBowls
                        ticketId={ticket.id}
                        line={line}
                        recordsBowls={can.recordsBowlsOn(line)}
                        explainsNoProduct={can.explainsNoProductOn(line)}
                        onRecordBowl={() => setBowlFor(line)}
                      />
                    </td>
                  </tr>
                )}
              </Fragment>
            ))}
          </tbody>
        </HTMLTable>
      )}
      {can.editable && <AddServiceForm ticketId={ticket.id} services={services} staff={staff} ownStaffId={can.ownStaffId} />}
      <ServiceLineDialog ticketId={ticket.id} line={editing} services={services} staff={staff} onClose={() => setEditing(null)} />
      {bowlFor && (
        <BowlEditor
          isOpen
          ticketId={ticket.id}
          line={bowlFor}
          products={products}
          staff={staff}
          patchTestNote={patchTestNote}
          onClose={() => setBowlFor(null)}
        />
      )}
    </section>
  );
}
