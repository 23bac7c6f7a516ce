import type { RecordableEvent } from '../../events/recordable-event.js';

export class AdjustmentAdded implements RecordableEvent {
  readonly aggregateType = 'Adjustment';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    readonly payload: Record<string, unknown>,
  ) {}
}
