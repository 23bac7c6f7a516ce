import { Module } from '@nestjs/common';
import { AddRetailLineHandler } from './commands/add-retail-line.handler.js';
import { AddServiceLineHandler } from './commands/add-service-line.handler.js';
import { AddTipHandler } from './commands/add-tip.handler.js';
import { CloseTicketHandler } from './commands/close-ticket.handler.js';
import { OpenTicketHandler } from './commands/open-ticket.handler.js';
import { RecordBowlHandler } from './commands/record-bowl.handler.js';
import { RefundTicketHandler } from './commands/refund-ticket.handler.js';
import { RemoveBowlHandler } from './commands/remove-bowl.handler.js';
import { RemoveRetailLineHandler } from './commands/remove-retail-line.handler.js';
import { RemoveServiceLineHandler } from './commands/remove-service-line.handler.js';
import { RemoveTipHandler } from './commands/remove-tip.handler.js';
import { TakePaymentHandler } from './commands/take-payment.handler.js';
import { UpdateServiceLineHandler } from './commands/update-service-line.handler.js';
import { VoidTicketHandler } from './commands/void-ticket.handler.js';
import { CardPaymentSettledHandler } from './events/card-payment-settled.handler.js';
import { GetTicketHandler } from './queries/get-ticket.handler.js';
import { ListTicketsHandler } from './queries/list-tickets.handler.js';
import { TicketEditing } from './ticket-editing.js';
import { TicketReferences } from './ticket-references.js';
import { TicketsController } from './tickets.controller.js';
import { TicketsRepository } from './tickets.repository.js';

@Module({
  controllers: [TicketsController],
  providers: [
    TicketsRepository,
    TicketReferences,
    TicketEditing,
    OpenTicketHandler,
    AddServiceLineHandler,
    UpdateServiceLineHandler,
    RemoveServiceLineHandler,
    RecordBowlHandler,
    RemoveBowlHandler,
    AddRetailLineHandler,
    RemoveRetailLineHandler,
    AddTipHandler,
    RemoveTipHandler,
    TakePaymentHandler,
    CloseTicketHandler,
    VoidTicketHandler,
    RefundTicketHandler,
    GetTicketHandler,
    ListTicketsHandler,
    CardPaymentSettledHandler,
  ],
})
export class TicketsModule {}
