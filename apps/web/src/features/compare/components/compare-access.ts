import type { AppAbility } from '../../../lib/ability';
import { businessDateIn } from '../../../lib/business-date';

/** Whether the person may open the comparison: the owner, the accountant and managers (DESIGN.md §2). */
export const canCompare = (ability: AppAbility): boolean => ability.can('read', 'BranchFigures');

/**
 * The business date today for the comparison's presets: in the time zone of the person's first branch
 * (a branch's own page uses that branch's zone).
 */
export const todayFor = (branches: { timeZone: string }[]): string => businessDateIn(branches[0]?.timeZone ?? 'UTC');
