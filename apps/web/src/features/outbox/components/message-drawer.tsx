import { Callout, Classes, Drawer, Intent } from '@blueprintjs/core';
import { EnvelopeIcon, PaperclipIcon } from '@blueprintjs/icons';
import type { OutboundMessage } from '../api/outbox-queries';
import { MessageStatus } from './message-status';
import { messageKindText, messageTimeText } from './message-time';

type Props = { message: OutboundMessage | null; timeZone: string; onClose: () => void };

/**
 * One message as it was sent: who, when, what happened, and the plain-text body word for word. No backdrop
 * and no focus trap, so the arrow keys keep moving through the list behind it.
 */
export function MessageDrawer({ message, timeZone, onClose }: Props) {
  return (
    <Drawer
      isOpen={message !== null}
      onClose={onClose}
      size="min(600px, 96vw)"
      icon={<EnvelopeIcon />}
      title={message?.subject ?? ''}
      hasBackdrop={false}
      enforceFocus={false}
      autoFocus={false}
      className="tr-outbox-drawer"
    >
      {message && (
        <section className={Classes.DRAWER_BODY} aria-label="Message">
          <div className="tr-outbox-detail">
            <dl className="tr-outbox-facts">
              <dt>To</dt>
              <dd>{message.recipient || <span className="tr-muted">No address on file</span>}</dd>
              <dt>When</dt>
              <dd>{messageTimeText(message.createdAt, timeZone)}</dd>
              <dt>What</dt>
              <dd>{messageKindText(message.kind)}</dd>
              <dt>Status</dt>
              <dd>
                <MessageStatus status={message.status} />
              </dd>
              <dt>Attachment</dt>
              <dd>
                {message.attachmentName ? (
                  <>
                    <PaperclipIcon size={12} className="tr-muted" /> {message.attachmentName}
                  </>
                ) : (
                  <span className="tr-muted">None</span>
                )}
              </dd>
            </dl>
            {message.status === 'failed' && (
              <Callout intent={Intent.DANGER} title="Why it was not sent" className="tr-outbox-error">
                {message.error ?? 'The mail server gave no reason.'}
              </Callout>
            )}
            <h3 className="tr-outbox-body-title">Message</h3>
            <pre className="tr-outbox-body" tabIndex={0} aria-label="Message text">
              {message.textBody}
            </pre>
          </div>
        </section>
      )}
    </Drawer>
  );
}
