import { outboundMessages } from '@tressury/schema';
import type { DefineRules } from '../authz/ability.js';
import type { FieldMap } from '../authz/accessible-by.js';

export const outboundMessageColumns: FieldMap = { organisationId: outboundMessages.organisationId };

// Mail the app sent carries pay figures (statements): only those who read every pay figure see the outbox.
export const defineMailRules: DefineRules = (user, { can }) => {
  if (user.role === 'owner' || user.role === 'accountant') {
    can('read', 'OutboundMessage', { organisationId: user.organisationId });
    can('create', 'OutboundMessage', { organisationId: user.organisationId });
  }
};
