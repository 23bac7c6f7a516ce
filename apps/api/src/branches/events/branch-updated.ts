import type { RecordableEvent } from '../../events/recordable-event.js';
import type { BranchView } from '../dto/branch.view.js';

export class BranchUpdated implements RecordableEvent {
  readonly aggregateType = 'Branch';
  readonly payload: Record<string, unknown>;

  constructor(
    readonly organisationId: string,
    readonly aggregateId: string,
    readonly actorId: string,
    before: BranchView,
    after: BranchView,
  ) {
    this.payload = { before, after };
  }
}
