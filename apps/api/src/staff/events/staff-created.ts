import type { RecordableEvent } from '../../events/recordable-event.js';
import type { StaffView } from '../dto/staff.view.js';

/** `after` carries the hourly rate: the event log is internal and never served to a role without pay rights. */
export class StaffCreated implements RecordableEvent {
  readonly aggregateType = 'Staff';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    after: StaffView,
  ) {
    this.payload = { after };
  }
}
