import type { RecordableEvent } from '../../events/recordable-event.js';
import type { ServiceView } from '../dto/service.view.js';
import type { ImportedFrom } from './imported-from.js';

export class ServiceCreated implements RecordableEvent {
  readonly aggregateType = 'Service';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    after: ServiceView,
    importedFrom?: ImportedFrom,
  ) {
    this.payload = importedFrom ? { after, importedFrom } : { after };
  }
}
