import type { RecordableEvent } from '../../events/recordable-event.js';

export class PayPlanAssigned implements RecordableEvent {
  readonly aggregateType = 'PayPlan';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string | null,
    readonly payload: Record<string, unknown>,
  ) {}
}
