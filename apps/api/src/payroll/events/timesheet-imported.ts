import type { RecordableEvent } from '../../events/recordable-event.js';

export class TimesheetImported implements RecordableEvent {
  readonly aggregateType = 'PayPeriod';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string | null,
    readonly payload: Record<string, unknown>,
  ) {}
}
