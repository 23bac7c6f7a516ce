import type { RecordableEvent } from '../../events/recordable-event.js';

export class PayScheduleSet implements RecordableEvent {
  readonly aggregateType = 'PaySchedule';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string | null,
    readonly payload: Record<string, unknown>,
  ) {}
}
