import { Command } from '@nestjs/cqrs';
import type { ProcessorEventReceipt } from '../dto/processor-event-receipt.view.js';

export class ReceiveProcessorEventCommand extends Command<ProcessorEventReceipt> {
  constructor(
    /** The body exactly as it arrived: the signature covers these bytes, not a re-serialised object. */
    readonly rawBody: Buffer | undefined,
    readonly signature: string | undefined,
  ) {
    super();
  }
}
