import type { RecordableEvent } from '../../events/recordable-event.js';
import type { LevelView } from '../dto/level.view.js';

export class LevelUpdated implements RecordableEvent {
  readonly aggregateType = 'Level';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    before: LevelView,
    after: LevelView,
  ) {
    this.payload = { before, after };
  }
}
