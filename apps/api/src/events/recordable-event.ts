/** A domain event that is stored in `domain_events` with the write it describes. Past tense, no suffix. */
export interface RecordableEvent {
  readonly organisationId: string;
  readonly aggregateType: string;
  readonly aggregateId: string;
  readonly actorId: string | null;
  readonly payload: Record<string, unknown>;
}
