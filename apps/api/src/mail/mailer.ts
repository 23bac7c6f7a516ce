import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { type SmtpFake, startSmtpFake } from '@tressury/fakes';
import type { OutboundMessageRow } from '@tressury/schema';
import nodemailer, { type Transporter } from 'nodemailer';
import type SMTPPool from 'nodemailer/lib/smtp-pool/index.js';
import type { AppConfig, MailSettings } from '../config.js';
import { Database } from '../database/database.js';
import { OutboxRepository } from './outbox.repository.js';

export type MailAttachment = { filename: string; contentType: string; content: Buffer };

/** One e-mail and what the outbox records about it. */
export type OutgoingMail = {
  organisationId: string;
  /** What the message is, e.g. `pay_statement`. */
  kind: string;
  to: { name: string; address: string };
  recipientStaffId: string | null;
  subject: string;
  text: string;
  attachment?: MailAttachment;
  /** The record it is about, e.g. `payroll_run:<id>`. */
  subjectRef: string | null;
  sentById: string | null;
};

type Outcome = { status: 'sent'; transportMessageId: string | null } | { status: 'failed'; error: string };

// One slow or silent server must not hold a request for nodemailer's default two minutes per message.
const TIMEOUTS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 60_000 };
const MAX_CONNECTIONS = 3;

/**
 * Outgoing mail over SMTP with nodemailer. Without SMTP_HOST it starts the local SMTP fake (tools/fakes) and
 * sends there, so both modes run the same code; every message, sent or not, is recorded in the outbox.
 */
@Injectable()
export class Mailer implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('Mailer');
  private readonly settings: MailSettings;
  private transport: Transporter<SMTPPool.SentMessageInfo> | null = null;
  private runningFake: SmtpFake | null = null;

  constructor(
    config: ConfigService<AppConfig, true>,
    private readonly database: Database,
    private readonly outbox: OutboxRepository,
  ) {
    this.settings = config.get('mail', { infer: true });
  }

  /** The local fake in fake mode, null with a real server; tests read the messages it captured. */
  get fake(): SmtpFake | null {
    return this.runningFake;
  }

  async onModuleInit(): Promise<void> {
    const pool = { pool: true as const, maxConnections: MAX_CONNECTIONS, ...TIMEOUTS };
    if (this.settings.mode === 'smtp') {
      const { host, port, secure, user, password } = this.settings.server;
      // STARTTLS is used whenever the server offers it; with a password it is required, so the password never travels in clear.
      const auth = user ? { auth: { user, pass: password ?? '' }, requireTLS: !secure } : {};
      this.transport = nodemailer.createTransport({ ...pool, host, port, secure, ...auth });
      this.logger.log(`Mail goes to the SMTP server ${host}:${port}`);
      return;
    }
    this.runningFake = await startSmtpFake({ port: this.settings.fakePort });
    const { host, port } = this.runningFake;
    this.transport = nodemailer.createTransport({ ...pool, host, port, secure: false, ignoreTLS: true });
    this.logger.log(`Mail goes to the local SMTP fake on ${host}:${port}; nothing leaves the machine (see the Outbox page)`);
  }

  async onModuleDestroy(): Promise<void> {
    this.transport?.close();
    await this.runningFake?.stop();
  }

  /**
   * Sends one message and records it in the outbox: `sent` with the server's message id, or `failed` with
   * the reason (a refusal or an unreachable server is a result, not an exception).
   */
  async send(mail: OutgoingMail): Promise<OutboundMessageRow> {
    // On PGlite a transaction holds the whole database: a network wait inside one would stall every request.
    if (this.database.inTransaction) throw new Error('Mail must not be sent inside a database transaction');
    let outcome: Outcome;
    try {
      const info = await this.client.sendMail({
        from: this.settings.from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        attachments: mail.attachment ? [mail.attachment] : [],
      });
      outcome = { status: 'sent', transportMessageId: info.messageId ?? null };
    } catch (error) {
      outcome = { status: 'failed', error: failureText(error) };
      this.logger.warn(`Mail to ${mail.to.address} not sent: ${outcome.error}`);
    }
    return this.record(mail, mail.to.address, outcome);
  }

  /** Records a message that could not be sent at all (e.g. no address on file), so the outbox shows the gap. */
  async recordNotSent(mail: Omit<OutgoingMail, 'to'> & { to: { name: string; address: string | null } }, reason: string): Promise<OutboundMessageRow> {
    return this.record(mail, mail.to.address ?? '', { status: 'failed', error: reason });
  }

  private record(mail: Omit<OutgoingMail, 'to'>, recipient: string, outcome: Outcome): Promise<OutboundMessageRow> {
    return this.outbox.insert({
      organisationId: mail.organisationId,
      kind: mail.kind,
      recipient,
      recipientStaffId: mail.recipientStaffId,
      subject: mail.subject,
      textBody: mail.text,
      attachmentName: mail.attachment?.filename ?? null,
      subjectRef: mail.subjectRef,
      sentById: mail.sentById,
      ...outcome,
    });
  }

  private get client(): Transporter<SMTPPool.SentMessageInfo> {
    if (!this.transport) throw new Error('Mailer was used before its module started');
    return this.transport;
  }
}

type SmtpError = { message?: unknown; code?: string; responseCode?: number; response?: string };

/** The reason in words for the outbox, with the server's own answer kept for whoever looks into it. */
function failureText(error: unknown): string {
  // Duck-typed: a socket error may come from another realm (e.g. a test sandbox), where instanceof Error fails.
  const { message, code, responseCode, response } = (typeof error === 'object' && error !== null ? error : {}) as SmtpError;
  const detail = typeof message === 'string' ? message : String(error);
  if (code === 'EAUTH') return `The mail server refused the sign-in (check SMTP_USER and SMTP_PASSWORD): ${response ?? detail}`;
  if (responseCode) return `The mail server refused the message: ${response ?? detail}`;
  if (code === 'ECONNECTION' || code === 'ESOCKET' || code === 'ETIMEDOUT' || code === 'EDNS' || code === 'ETLS') return `The mail server could not be reached: ${detail}`;
  return `The message could not be sent: ${detail}`;
}
