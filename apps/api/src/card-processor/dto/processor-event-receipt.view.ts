/** The answer to the card processor: any 2xx stops its retries. */
export class ProcessorEventReceipt {
  received: true;
  /** True when this event id had been handled before and was ignored this time. */
  duplicate: boolean;
}
