import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { DomainError, negateMoney as negate, retailLineAmounts, sumMoney } from '@tressury/domain';
import Big from 'big.js';
import { CardProcessor } from '../../card-processor/card-processor.js';
import { businessDateIn } from '../../common/business-date.js';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import type { TicketView } from '../dto/ticket.view.js';
import type { RefundTicketDto } from '../dto/refund-ticket.dto.js';
import { TicketRefunded } from '../events/ticket-events.js';
import { TicketEditing } from '../ticket-editing.js';
import { dayLocked, invalidReference, notOnTicket } from '../ticket-errors.js';
import { type LoadedTicket, TicketsRepository } from '../tickets.repository.js';
import { RefundTicketCommand } from './refund-ticket.command.js';

type RefundPlan = {
  refundDate: string;
  amount: string;
  serviceLines: LoadedTicket['serviceLines'];
  retail: { line: LoadedTicket['retailLines'][number]; quantity: number; amount: string; tax: string }[];
  /** The card charge the money goes back to. */
  processorPaymentId: string | null;
};

/**
 * A refund after close is booked as negative lines on the day it happens (a later open day of the
 * branch), so the closed day stays as it was counted. The money goes back in cash or to the card it
 * was paid with; the processor is called between two transactions, with a key derived from the
 * request's, so a retried refund is made once.
 */
@CommandHandler(RefundTicketCommand)
export class RefundTicketHandler implements ICommandHandler<RefundTicketCommand> {
  constructor(
    private readonly database: Database,
    private readonly editing: TicketEditing,
    private readonly tickets: TicketsRepository,
    private readonly events: EventLog,
    private readonly processor: CardProcessor,
  ) {}

  async execute({ user, ticketId, input }: RefundTicketCommand): Promise<TicketView> {
    const planned = await this.database.transaction(async () => {
      const loaded = await this.editing.check(user, ticketId, 'refund', { statuses: ['closed'], allowLockedDay: true });
      if (await this.tickets.findPaymentByKey(ticketId, input.idempotencyKey)) return null;
      return this.plan(loaded, input);
    });
    if (!planned) return this.editing.view(user.organisationId, ticketId);

    let processorRefundId: string | null = null;
    if (planned.processorPaymentId) {
      const refund = await this.processor.refund({
        processorPaymentId: planned.processorPaymentId,
        amount: planned.amount,
        idempotencyKey: `tressury-refund-${ticketId}-${input.idempotencyKey}`,
      });
      if (refund.status === 'failed') throw new DomainError('refund.failed', 'The card processor refused the refund; refund in cash instead.', 'conflict');
      processorRefundId = refund.processorRefundId;
    }

    return this.database.transaction(async () => {
      const loaded = await this.editing.check(user, ticketId, 'refund', { statuses: ['closed'], allowLockedDay: true });
      if (await this.tickets.findPaymentByKey(ticketId, input.idempotencyKey)) return this.editing.view(user.organisationId, ticketId);
      // Planned again under the row lock: a concurrent refund of the same lines is caught here.
      const plan = await this.plan(loaded, input);
      if (plan.amount !== planned.amount) throw new DomainError('refund.changed', 'The ticket changed while refunding; look again and retry.', 'conflict');
      const lines = [];
      for (const line of plan.serviceLines) {
        const { id: _id, bowls: _bowls, createdAt: _createdAt, ...copy } = line;
        lines.push(
          await this.tickets.insertServiceLine({
            ...copy,
            listPrice: negate(line.listPrice),
            discount: negate(line.discount),
            price: negate(line.price),
            noProductReason: null,
            bookedOn: plan.refundDate,
            refundOfLineId: line.id,
          }),
        );
      }
      for (const item of plan.retail) {
        const { id: _id, createdAt: _createdAt, ...copy } = item.line;
        lines.push(
          await this.tickets.insertRetailLine({
            ...copy,
            quantity: -item.quantity,
            amount: item.amount,
            tax: item.tax,
            bookedOn: plan.refundDate,
            refundOfLineId: item.line.id,
          }),
        );
      }
      const payment = await this.tickets.insertPayment({
        ticketId,
        method: input.method,
        kind: 'refund',
        status: 'succeeded',
        amount: negate(plan.amount),
        processorPaymentId: plan.processorPaymentId,
        processorRefundId,
        idempotencyKey: input.idempotencyKey,
        bookedOn: plan.refundDate,
        takenById: user.id,
      });
      await this.events.append(new TicketRefunded(user.organisationId, ticketId, user.id, { reason: input.reason, refundDate: plan.refundDate, lines, payment }));
      return this.editing.view(user.organisationId, ticketId);
    });
  }

  private async planDate(loaded: LoadedTicket): Promise<string> {
    const refundDate = businessDateIn(loaded.branch.timeZone);
    if (await this.tickets.isDayClosed(loaded.branch.id, refundDate)) throw dayLocked(refundDate);
    return refundDate;
  }

  private async plan(loaded: LoadedTicket, input: RefundTicketDto): Promise<RefundPlan> {
    const refundDate = await this.planDate(loaded);
    const refundedLineIds = new Set(loaded.serviceLines.map((l) => l.refundOfLineId).filter((id) => id !== null));
    const serviceLines = input.serviceLineIds.map((id, i) => {
      const line = loaded.serviceLines.find((l) => l.id === id && l.refundOfLineId === null);
      if (!line) throw notOnTicket('service_line', `serviceLineIds[${i}]`);
      if (refundedLineIds.has(id)) throw invalidReference(`serviceLineIds[${i}]`, `${line.serviceName} has already been refunded.`);
      return line;
    });
    const retail = input.retail.map((item, i) => {
      const line = loaded.retailLines.find((l) => l.id === item.retailLineId && l.refundOfLineId === null);
      if (!line) throw notOnTicket('retail_line', `retail[${i}].retailLineId`);
      const returned = loaded.retailLines.filter((l) => l.refundOfLineId === line.id).reduce((n, l) => n - l.quantity, 0);
      if (item.quantity > line.quantity - returned) {
        throw invalidReference(`retail[${i}].quantity`, `Only ${line.quantity - returned} of ${line.productName} can still be returned.`);
      }
      return { line, quantity: item.quantity, ...retailLineAmounts({ quantity: -item.quantity, unitPrice: line.unitPrice, taxRate: line.taxRate }) };
    });
    const amount = sumMoney([...serviceLines.map((l) => l.price), ...retail.flatMap((r) => [negate(r.amount), negate(r.tax)])]);
    if (!new Big(amount).gt(0)) throw invalidReference('serviceLineIds', 'Choose at least one service or retail item to refund.');

    let processorPaymentId: string | null = null;
    if (input.method === 'card') {
      const charge = loaded.payments.find((p) => {
        if (p.method !== 'card' || p.kind !== 'charge' || p.status !== 'succeeded' || !p.processorPaymentId) return false;
        const refunded = loaded.payments
          .filter((r) => r.kind === 'refund' && r.processorPaymentId === p.processorPaymentId)
          .reduce((total, r) => total.plus(r.amount), new Big(0));
        return new Big(p.amount).plus(refunded).gte(amount);
      });
      if (!charge) throw invalidReference('method', 'No card payment on this ticket covers that amount; refund in cash instead.');
      processorPaymentId = charge.processorPaymentId;
    }
    return { refundDate, amount, serviceLines, retail, processorPaymentId };
  }
}

