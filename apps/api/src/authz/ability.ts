import type { AbilityBuilder, ForcedSubject, MongoAbility } from '@casl/ability';
import type { AuthUser } from '../auth/auth-user.js';

export const actions = ['manage', 'create', 'read', 'update', 'delete'] as const;
export type Action = (typeof actions)[number];

// The fields CASL conditions may name, per subject; each must map to a column in accessibleBy().
type Records = {
  Organisation: { id: string };
  Branch: { id: string; organisationId: string };
  User: { id: string; organisationId: string };
};
type Tagged = { [N in keyof Records]: ForcedSubject<N> & Records[N] }[keyof Records];

export type SubjectName = keyof Records | 'all';
export type AppAbility = MongoAbility<[Action, SubjectName | Tagged]>;

/** A feature's rules: each feature adds its own to the builder in `<feature>.policies.ts`. */
export type DefineRules = (user: AuthUser, builder: AbilityBuilder<AppAbility>) => void;
