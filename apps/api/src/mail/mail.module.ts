import { Global, Module } from '@nestjs/common';
import { MailController } from './mail.controller.js';
import { Mailer } from './mailer.js';
import { OutboxRepository } from './outbox.repository.js';
import { ListOutboxHandler } from './queries/list-outbox.handler.js';

/** Global so any feature's handler can inject Mailer (e.g. payroll statements) without importing this module. */
@Global()
@Module({
  controllers: [MailController],
  providers: [Mailer, OutboxRepository, ListOutboxHandler],
  exports: [Mailer],
})
export class MailModule {}
