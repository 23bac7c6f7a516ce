import type { RecordableEvent } from '../../events/recordable-event.js';

export class PayStatementsSent implements RecordableEvent {
  readonly aggregateType = 'PayrollRun';

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string | null,
    readonly payload: Record<string, unknown>,
  ) {}
}
