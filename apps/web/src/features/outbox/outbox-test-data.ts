import type { Me } from '../../lib/session';
import { ownerMe } from '../../test/sessions';
import type { OutboundMessage } from './api/outbox-queries';

const organisationId = ownerMe.organisationId;

// Rules as the API packs them (mail.policies.ts).
export const outboxAccountantMe: Me = {
  ...ownerMe,
  id: 'c0ffee00-0000-4000-8000-000000000005',
  role: 'accountant',
  displayName: 'Wendeline Sparrowhawk',
  rules: [
    ['read', 'Organisation', { id: organisationId }],
    ['read', 'OutboundMessage', { organisationId }],
    ['create', 'OutboundMessage', { organisationId }],
  ],
};

export const outboxManagerMe: Me = {
  ...ownerMe,
  id: 'c0ffee00-0000-4000-8000-000000000002',
  role: 'manager',
  displayName: 'Halvard Nyquist-Oduya',
  rules: [['read', 'Organisation', { id: organisationId }]],
};

const body = (name: string, gross: string) =>
  [
    `Hello ${name},`,
    '',
    'Here is your pay statement from Fernhollow Hair Studios for the pay period 2026-03-01 to 2026-03-14.',
    '',
    `Gross pay                                            ${gross} USD`,
    '',
    'These figures follow the pay rules configured in Tressury. Local law governs: have them confirmed by a payroll professional before paying.',
  ].join('\n');

const statement = (n: number, name: string, recipient: string, createdAt: string, extra: Partial<OutboundMessage> = {}): OutboundMessage => ({
  id: `0e7b0000-0000-4000-8000-${String(n).padStart(12, '0')}`,
  kind: 'pay_statement',
  recipient,
  recipientStaffId: `57aff000-0000-4000-8000-${String(n).padStart(12, '0')}`,
  subject: 'Pay statement 2026-03-01 to 2026-03-14 (Fernhollow Hair Studios)',
  textBody: body(name, '1,204.50'),
  attachmentName: `pay-statement-${name.replace(' ', '-')}-2026-03-01-to-2026-03-14.xlsx`,
  subjectRef: 'payroll_run:9a9a0000-0000-4000-8000-000000000001',
  status: 'sent',
  error: null,
  createdAt,
  ...extra,
});

/** Newest first, as the API lists them: one sent at 5:54 pm Chicago time, one that could not be sent. */
export const outboxMessages: OutboundMessage[] = [
  statement(1, 'Jorunn Aldersey', 'jorunn@example.test', '2026-03-14T22:54:00.000Z'),
  statement(2, 'Tamsin Orrell', '', '2026-03-14T22:53:30.000Z', {
    status: 'failed',
    attachmentName: null,
    error: 'No e-mail address on file for Tamsin Orrell: add one under People, then send the statements again.',
    textBody: body('Tamsin Orrell', '655.10'),
  }),
];

/** `count` sent messages, a minute apart, newest first. */
export const manyMessages = (count: number, offset = 0): OutboundMessage[] =>
  Array.from({ length: count }, (_, i) =>
    statement(100 + offset + i, `Person ${offset + i}`, `person${offset + i}@example.test`, new Date(Date.UTC(2026, 2, 14, 22, 0) - (offset + i) * 60_000).toISOString()),
  );
