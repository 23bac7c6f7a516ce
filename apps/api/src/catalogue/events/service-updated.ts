import type { RecordableEvent } from '../../events/recordable-event.js';
import type { ServiceView } from '../dto/service.view.js';
import type { ImportedFrom } from './imported-from.js';

export class ServiceUpdated implements RecordableEvent {
  readonly aggregateType = 'Service';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    before: ServiceView,
    after: ServiceView,
    importedFrom?: ImportedFrom,
  ) {
    this.payload = importedFrom ? { before, after, importedFrom } : { before, after };
  }
}
