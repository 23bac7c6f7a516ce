import type { Ticket } from '../api/ticket-queries';
import { signOf } from './figures';

/** Why the ticket cannot be closed yet, in the order the desk would deal with them; empty when it can. */
export function closeBlockers(ticket: Ticket): string[] {
  const blockers: string[] = [];
  const services = ticket.serviceLines.filter((l) => l.refundOfLineId === null);
  if (services.length === 0 && ticket.retailLines.length === 0) blockers.push('Nothing is on the ticket yet.');
  for (const line of services) {
    if (line.isColour && line.bowls.length === 0 && !line.noProductReason) {
      blockers.push(`${line.serviceName} (${line.staffName}) needs a bowl, or a reason why no product was used.`);
    }
  }
  if (ticket.payments.some((p) => p.status === 'pending')) blockers.push('A card payment is still waiting for the card processor.');
  const due = signOf(ticket.totals.due);
  if (due > 0) blockers.push(`${ticket.totals.due} is still due.`);
  if (due < 0) blockers.push(`${ticket.totals.due.slice(1)} more was paid than owed; refund the difference first.`);
  return blockers;
}
