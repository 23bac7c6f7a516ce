import { OutboundMessageView } from '../../mail/dto/outbound-message.view.js';

/** What happened to each staff member's statement: one outbox record each, sent or failed with the reason. */
export class SentStatementsView {
  sent: number;
  failed: number;
  messages: OutboundMessageView[];
}
