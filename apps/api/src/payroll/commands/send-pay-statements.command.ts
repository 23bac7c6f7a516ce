import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { SentStatementsView } from '../dto/sent-statements.view.js';

export class SendPayStatementsCommand extends Command<SentStatementsView> {
  constructor(
    readonly user: AuthUser,
    readonly runId: string,
  ) {
    super();
  }
}
