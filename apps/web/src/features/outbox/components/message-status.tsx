import { Intent, Tag } from '@blueprintjs/core';
import { TickCircleIcon, WarningSignIcon } from '@blueprintjs/icons';
import type { OutboundMessage } from '../api/outbox-queries';

/** Sent or not, in words and an icon as well as colour. */
export function MessageStatus({ status }: { status: OutboundMessage['status'] }) {
  return status === 'sent' ? (
    <Tag minimal intent={Intent.SUCCESS} icon={<TickCircleIcon />}>
      Sent
    </Tag>
  ) : (
    <Tag minimal intent={Intent.DANGER} icon={<WarningSignIcon />}>
      Not sent
    </Tag>
  );
}
