import type { AddressInfo } from 'node:net';
import { type AddressObject, simpleParser } from 'mailparser';
import { SMTPServer, type SMTPServerAddress } from 'smtp-server';

export type SmtpFakeOptions = {
  /** 0 (the default) takes any free port. */
  port?: number;
  /** Largest message accepted, in bytes; 10 MB when left out. */
  maxMessageBytes?: number;
};

export type CapturedAttachment = { filename: string | null; contentType: string; size: number; content: Buffer };

/** One message as the fake received it: the SMTP envelope and the parsed headers, text and attachments. */
export type CapturedMessage = {
  /** The envelope (MAIL FROM / RCPT TO), which decides delivery whatever the headers say. */
  envelope: { from: string | null; to: string[] };
  messageId: string | null;
  from: string | null;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  attachments: CapturedAttachment[];
  receivedAt: Date;
};

export type SmtpFake = {
  host: '127.0.0.1';
  port: number;
  /** Every message received so far, oldest first. */
  messages(): CapturedMessage[];
  /** The messages delivered to `address` (envelope recipient, any case), oldest first. */
  messagesTo(address: string): CapturedMessage[];
  clear(): void;
  stop(): Promise<void>;
};

const DEFAULT_MAX_BYTES = 10 * 1024 * 1024;

/**
 * A local mail server for development and tests: speaks SMTP on 127.0.0.1 without TLS, takes any sign-in or
 * none, and keeps each message parsed in memory (gone when it stops). Nothing is relayed anywhere.
 */
export async function startSmtpFake(options: SmtpFakeOptions = {}): Promise<SmtpFake> {
  const maxBytes = options.maxMessageBytes ?? DEFAULT_MAX_BYTES;
  let captured: CapturedMessage[] = [];
  let stopped = false;

  const server = new SMTPServer({
    // The client is told to skip TLS (nodemailer's ignoreTLS); no certificate is needed on a loopback fake.
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    allowInsecureAuth: true,
    disableReverseLookup: true,
    size: maxBytes,
    logger: false,
    // Open client connections (a pooled transport) get a short grace period when the fake stops.
    closeTimeout: 500,
    banner: 'Tressury local mail fake',
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? 'anyone' });
    },
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
            const tooLarge = Object.assign(new Error(`Message exceeds the fake's limit of ${maxBytes} bytes`), { responseCode: 552 });
            callback(tooLarge);
            return;
          }
          captured.push({
            envelope: { from: addressOf(session.envelope.mailFrom), to: session.envelope.rcptTo.map((r) => r.address) },
            messageId: mail.messageId ?? null,
            from: mail.from?.value[0]?.address ?? null,
            to: addressesOf(mail.to),
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : null,
            attachments: mail.attachments.map((a) => ({ filename: a.filename ?? null, contentType: a.contentType, size: a.size, content: a.content })),
            receivedAt: new Date(),
          });
          // Accepted only once stored: when the client's send resolves, the message is readable here.
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const port = (server.server.address() as AddressInfo).port;

  return {
    host: '127.0.0.1',
    port,
    messages: () => [...captured],
    messagesTo: (address) => captured.filter((m) => m.envelope.to.some((to) => to.toLowerCase() === address.toLowerCase())),
    clear() {
      captured = [];
    },
    async stop() {
      if (stopped) return;
      stopped = true;
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

function addressOf(address: SMTPServerAddress | false): string | null {
  return address ? address.address : null;
}

function addressesOf(field: AddressObject | AddressObject[] | undefined): string[] {
  if (!field) return [];
  return (Array.isArray(field) ? field : [field]).flatMap((group) => group.value.map((a) => a.address ?? '')).filter(Boolean);
}
