import type { RecordableEvent } from '../../events/recordable-event.js';

export class TimesheetHoursSet implements RecordableEvent {
  readonly aggregateType = 'TimesheetEntry';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string | null,
    readonly payload: Record<string, unknown>,
  ) {}
}
