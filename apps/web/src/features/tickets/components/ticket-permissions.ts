import { subject } from '@casl/ability';
import type { AppAbility } from '../../../lib/ability';
import type { Me } from '../../../lib/session';
import type { RetailLine, ServiceLine, Ticket } from '../api/ticket-queries';

export type TicketPermissions = {
  /** The ticket can still change: open, its day not closed, and the person may work on it. */
  editable: boolean;
  /** Prices, people, tips and removing lines: the front desk's and managers' part. */
  deskWork: boolean;
  /** A stylist's own staff record: she adds only her own services, sales and bowls. */
  ownStaffId: string | null;
  recordsBowlsOn: (line: ServiceLine) => boolean;
  explainsNoProductOn: (line: ServiceLine) => boolean;
  removesRetail: (line: RetailLine) => boolean;
  takesPayment: boolean;
  closes: boolean;
  voids: boolean;
  refunds: boolean;
};

/** What this person may do with this ticket, from the same CASL rules the server checks. */
export function ticketPermissions(ticket: Ticket, user: Me, ability: AppAbility): TicketPermissions {
  const staffIds = [...new Set(ticket.serviceLines.flatMap((l) => (l.assistantStaffId ? [l.staffId, l.assistantStaffId] : [l.staffId])))];
  const record = subject('Ticket', { id: ticket.id, organisationId: user.organisationId, branchId: ticket.branchId, staffIds });
  const open = ticket.status === 'open' && !ticket.locked;
  const editable = open && ability.can('update', record);
  // The server keeps a stylist to her own work (DESIGN.md §2), whatever else her rules allow.
  const ownStaffId = user.role === 'stylist' ? user.staffId : null;
  const deskWork = editable && ownStaffId === null;
  const isMine = (line: ServiceLine) => line.staffId === ownStaffId || line.assistantStaffId === ownStaffId;
  const current = (line: ServiceLine) => line.refundOfLineId === null;
  return {
    editable,
    deskWork,
    ownStaffId,
    recordsBowlsOn: (line) => editable && line.isColour && current(line) && (deskWork || isMine(line)),
    explainsNoProductOn: (line) => editable && line.isColour && current(line) && (deskWork || line.staffId === ownStaffId),
    removesRetail: (line) => editable && line.refundOfLineId === null && (deskWork || line.sellerStaffId === ownStaffId),
    takesPayment: open && ability.can('pay', record),
    closes: open && ability.can('close', record),
    voids: !ticket.locked && ticket.status !== 'void' && ability.can('void', record),
    refunds: ticket.status === 'closed' && ability.can('refund', record),
  };
}
