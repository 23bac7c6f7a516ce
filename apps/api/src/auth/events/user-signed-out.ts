import type { RecordableEvent } from '../../events/recordable-event.js';

export class UserSignedOut implements RecordableEvent {
  readonly aggregateType = 'User';
  readonly payload: Record<string, unknown> = {};

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
  ) {}

  get actorId(): string {
    return this.aggregateId;
  }
}
