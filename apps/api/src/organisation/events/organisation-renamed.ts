import type { RecordableEvent } from '../../events/recordable-event.js';

export class OrganisationRenamed implements RecordableEvent {
  readonly aggregateType = 'Organisation';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly actorId: string,
    before: { name: string },
    after: { name: string },
  ) {
    this.payload = { before, after };
  }

  get aggregateId(): string {
    return this.organisationId;
  }
}
