import type { LevelRow } from '@tressury/schema';

export class LevelView {
  id: string;
  /** Unique in the organisation, e.g. "Senior". */
  name: string;
  /** Order from the most junior (1) upwards; prices and lists follow it. */
  rank: number;
}

export function toLevelView(row: LevelRow): LevelView {
  return { id: row.id, name: row.name, rank: row.rank };
}
