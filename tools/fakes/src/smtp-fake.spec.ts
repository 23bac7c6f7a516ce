import nodemailer, { type Transporter } from 'nodemailer';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { type SmtpFake, startSmtpFake } from './smtp-fake.js';

describe('SMTP fake, driven through nodemailer', () => {
  let fake: SmtpFake;
  let transport: Transporter;

  beforeEach(async () => {
    fake = await startSmtpFake();
    transport = nodemailer.createTransport({ host: fake.host, port: fake.port, secure: false, ignoreTLS: true });
  });

  afterEach(async () => {
    transport.close();
    await fake.stop();
  });

  it('listens on a free loopback port and keeps what it receives, parsed', async () => {
    expect(fake.host).toBe('127.0.0.1');
    expect(fake.port).toBeGreaterThan(0);
    const workbook = Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x00, 0xff, 0x10]);
    const info = await transport.sendMail({
      from: 'Tressury <statements@salon.example>',
      to: 'Wren Halloway <wren.halloway@salon.example>',
      subject: 'Pay statement 2026-03-01 to 2026-03-14',
      text: 'Gross pay 1,234.56 USD\nTips 80.00 USD',
      attachments: [{ filename: 'statement.xlsx', content: workbook, contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' }],
    });

    const [message, ...others] = fake.messages();
    expect(others).toEqual([]);
    expect(message).toMatchObject({
      envelope: { from: 'statements@salon.example', to: ['wren.halloway@salon.example'] },
      messageId: info.messageId,
      from: 'statements@salon.example',
      to: ['wren.halloway@salon.example'],
      subject: 'Pay statement 2026-03-01 to 2026-03-14',
      html: null,
    });
    expect(message!.text.trim()).toBe('Gross pay 1,234.56 USD\nTips 80.00 USD');
    expect(message!.attachments).toHaveLength(1);
    expect(message!.attachments[0]).toMatchObject({ filename: 'statement.xlsx', contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', size: 7 });
    expect(message!.attachments[0]!.content.equals(workbook)).toBe(true);
  });

  it('finds messages by envelope recipient in any case, blind copies included, and clears them', async () => {
    await transport.sendMail({ from: 'a@salon.example', to: 'one@salon.example', subject: 'first', text: '1' });
    await transport.sendMail({ from: 'a@salon.example', to: 'two@salon.example', bcc: 'One@Salon.example', subject: 'second', text: '2' });

    expect(fake.messagesTo('ONE@salon.example').map((m) => m.subject)).toEqual(['first', 'second']);
    expect(fake.messagesTo('two@salon.example').map((m) => m.subject)).toEqual(['second']);
    expect(fake.messagesTo('nobody@salon.example')).toEqual([]);
    // A blind copy travels in the envelope only, never in the headers.
    expect(fake.messagesTo('two@salon.example')[0]!.to).toEqual(['two@salon.example']);

    fake.clear();
    expect(fake.messages()).toEqual([]);
  });

  it('takes any sign-in, as a real server configured with a user would be asked for one', async () => {
    const signingIn = nodemailer.createTransport({ host: fake.host, port: fake.port, secure: false, ignoreTLS: true, auth: { user: 'payroll', pass: 'anything' } });
    await signingIn.sendMail({ from: 'a@salon.example', to: 'b@salon.example', subject: 'signed in', text: 'x' });
    signingIn.close();
    expect(fake.messages().map((m) => m.subject)).toEqual(['signed in']);
  });

  it('refuses a message over its size limit and keeps nothing of it', async () => {
    const small = await startSmtpFake({ maxMessageBytes: 2_000 });
    const client = nodemailer.createTransport({ host: small.host, port: small.port, secure: false, ignoreTLS: true });
    const sending = client.sendMail({ from: 'a@salon.example', to: 'b@salon.example', subject: 'big', text: 'x'.repeat(10_000) });
    await expect(sending).rejects.toMatchObject({ responseCode: 552 });
    expect(small.messages()).toEqual([]);
    client.close();
    await small.stop();
  });

  it('is unreachable once stopped', async () => {
    await fake.stop();
    const sending = transport.sendMail({ from: 'a@salon.example', to: 'b@salon.example', subject: 'late', text: 'x' });
    await expect(sending).rejects.toMatchObject({ code: 'ESOCKET' });
  });
});
