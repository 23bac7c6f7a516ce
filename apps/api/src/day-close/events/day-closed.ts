import type { RecordableEvent } from '../../events/recordable-event.js';

export class DayClosed implements RecordableEvent {
  readonly aggregateType = 'DayClose';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    readonly payload: Record<string, unknown>,
  ) {}
}
