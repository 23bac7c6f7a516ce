import { HTMLTable } from '@blueprintjs/core';
import { PaperclipIcon } from '@blueprintjs/icons';
import { type KeyboardEvent, useRef } from 'react';
import type { OutboundMessage } from '../api/outbox-queries';
import { MessageStatus } from './message-status';
import { messageShortTimeText, messageTimeText } from './message-time';

type Props = { messages: OutboundMessage[]; selectedId: string | null; timeZone: string; onSelect: (id: string) => void; onClose: () => void };

/** Newest first; a row opens its message (click or Enter; the arrow keys move to the next one, Escape closes it). */
export function OutboxTable({ messages, selectedId, timeZone, onSelect, onClose }: Props) {
  const buttons = useRef(new Map<string, HTMLButtonElement>());

  const move = (event: KeyboardEvent, index: number) => {
    if (event.key === 'Escape') {
      onClose();
      return;
    }
    const step = event.key === 'ArrowDown' ? 1 : event.key === 'ArrowUp' ? -1 : 0;
    const target = messages[index + step];
    if (step === 0 || !target) return;
    event.preventDefault();
    onSelect(target.id);
    buttons.current.get(target.id)?.focus();
  };

  return (
    <div className="tr-table-frame">
      <HTMLTable compact interactive className="tr-table tr-outbox-table" aria-label="Sent mail">
        <thead>
          <tr>
            <th scope="col" className="tr-outbox-col-when">
              When
            </th>
            <th scope="col" className="tr-outbox-col-to">
              To
            </th>
            <th scope="col">Subject</th>
            <th scope="col" className="tr-outbox-col-status">
              Status
            </th>
            <th scope="col" className="tr-outbox-col-attachment">
              Attachment
            </th>
          </tr>
        </thead>
        <tbody>
          {messages.map((message, index) => {
            const selected = message.id === selectedId;
            return (
              <tr key={message.id} className={selected ? 'tr-outbox-selected' : undefined} onClick={() => onSelect(message.id)}>
                <td title={messageTimeText(message.createdAt, timeZone)}>{messageShortTimeText(message.createdAt, timeZone)}</td>
                <td title={message.recipient || undefined}>{message.recipient || <span className="tr-muted">No address on file</span>}</td>
                <td>
                  <button
                    type="button"
                    title={message.subject}
                    className="tr-outbox-open"
                    aria-current={selected ? 'true' : undefined}
                    ref={(node) => {
                      if (node) buttons.current.set(message.id, node);
                      else buttons.current.delete(message.id);
                    }}
                    onClick={(event) => {
                      event.stopPropagation();
                      onSelect(message.id);
                    }}
                    onKeyDown={(event) => move(event, index)}
                  >
                    {message.subject}
                  </button>
                </td>
                <td>
                  <MessageStatus status={message.status} />
                </td>
                <td title={message.attachmentName ?? undefined}>
                  {message.attachmentName ? (
                    <span>
                      <PaperclipIcon size={12} className="tr-muted" /> {message.attachmentName}
                    </span>
                  ) : (
                    <span className="tr-muted">None</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </div>
  );
}
