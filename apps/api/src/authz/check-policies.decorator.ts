import { SetMetadata } from '@nestjs/common';
import type { Action, SubjectName } from './ability.js';

export const CHECK_POLICIES = 'tressury:check-policies';
export type PolicyCheck = { action: Action; subject: SubjectName };

/** The route needs `action` on at least one `subject`; the handler then checks the loaded record. */
export const CheckPolicies = (action: Action, subject: SubjectName) => SetMetadata(CHECK_POLICIES, { action, subject } satisfies PolicyCheck);
