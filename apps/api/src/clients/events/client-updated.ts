import type { RecordableEvent } from '../../events/recordable-event.js';
import type { ClientView } from '../dto/client.view.js';

/** `before` and `after` are whole records, so a changed patch-test date is kept with its old value. */
export class ClientUpdated implements RecordableEvent {
  readonly aggregateType = 'Client';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    before: ClientView,
    after: ClientView,
  ) {
    this.payload = { before, after };
  }
}
