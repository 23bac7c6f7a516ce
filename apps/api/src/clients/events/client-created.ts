import type { RecordableEvent } from '../../events/recordable-event.js';
import type { ClientView } from '../dto/client.view.js';

export class ClientCreated implements RecordableEvent {
  readonly aggregateType = 'Client';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    after: ClientView,
  ) {
    this.payload = { after };
  }
}
