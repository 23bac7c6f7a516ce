import type { OutboundMessageRow, OutboundMessageStatus } from '@tressury/schema';

/** One e-mail the app handed to the mail server, or tried to. */
export class OutboundMessageView {
  id: string;
  /** What the message is, e.g. `pay_statement`. */
  kind: string;
  /** The address it went to; empty when there was none to send to. */
  recipient: string;
  recipientStaffId: string | null;
  subject: string;
  /** The plain-text body as sent. */
  textBody: string;
  attachmentName: string | null;
  /** The record the message is about, e.g. `payroll_run:<id>`. */
  subjectRef: string | null;
  status: OutboundMessageStatus;
  /** Why it was not sent, when it failed. */
  error: string | null;
  createdAt: string;
}

export const toOutboundMessageView = (row: OutboundMessageRow): OutboundMessageView => ({
  id: row.id,
  kind: row.kind,
  recipient: row.recipient,
  recipientStaffId: row.recipientStaffId,
  subject: row.subject,
  textBody: row.textBody,
  attachmentName: row.attachmentName,
  subjectRef: row.subjectRef,
  status: row.status,
  error: row.error,
  createdAt: row.createdAt.toISOString(),
});
