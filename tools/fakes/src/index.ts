export { startCardProcessorFake } from './card-processor-fake.js';
export type { CardProcessorFake, CardProcessorFakeOptions } from './card-processor-fake.js';
export { startSmtpFake } from './smtp-fake.js';
export type { CapturedAttachment, CapturedMessage, SmtpFake, SmtpFakeOptions } from './smtp-fake.js';
