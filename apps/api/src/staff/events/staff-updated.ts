import type { RecordableEvent } from '../../events/recordable-event.js';
import type { StaffView } from '../dto/staff.view.js';

export class StaffUpdated implements RecordableEvent {
  readonly aggregateType = 'Staff';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    before: StaffView,
    after: StaffView,
  ) {
    this.payload = { before, after };
  }
}
