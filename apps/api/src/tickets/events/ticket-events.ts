import type { RecordableEvent } from '../../events/recordable-event.js';

/** Every change to a ticket is one of these, stored in domain_events with its before/after figures. */
abstract class TicketEvent implements RecordableEvent {
  readonly aggregateType = 'Ticket';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    /** null when the card processor, not a person, made the change. */
    readonly actorId: string | null,
    readonly payload: Record<string, unknown>,
  ) {}
}

export class TicketOpened extends TicketEvent {}
export class ServiceLineAdded extends TicketEvent {}
export class ServiceLineChanged extends TicketEvent {}
export class ServiceLineRemoved extends TicketEvent {}
export class BowlRecorded extends TicketEvent {}
export class BowlRemoved extends TicketEvent {}
export class RetailLineAdded extends TicketEvent {}
export class RetailLineRemoved extends TicketEvent {}
export class TipAdded extends TicketEvent {}
export class TipRemoved extends TicketEvent {}
export class PaymentTaken extends TicketEvent {}
export class PaymentSettled extends TicketEvent {}
export class TicketClosed extends TicketEvent {}
export class TicketVoided extends TicketEvent {}
export class TicketRefunded extends TicketEvent {}
