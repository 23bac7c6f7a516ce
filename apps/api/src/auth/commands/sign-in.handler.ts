import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { wrongCredentials } from '../auth-errors.js';
import { AuthRepository } from '../auth.repository.js';
import { UserSignedIn } from '../events/user-signed-in.js';
import { verifyPassword } from '../passwords.js';
import { type IssuedSession, SessionIssuer } from '../session-issuer.js';
import { SignInCommand } from './sign-in.command.js';

@CommandHandler(SignInCommand)
export class SignInHandler implements ICommandHandler<SignInCommand> {
  constructor(
    private readonly database: Database,
    private readonly repository: AuthRepository,
    private readonly sessions: SessionIssuer,
    private readonly events: EventLog,
  ) {}

  async execute({ email, password }: SignInCommand): Promise<IssuedSession> {
    // The slow hash check runs outside the transaction: on PGlite a transaction holds the whole database.
    const user = await this.repository.findUserByEmail(email);
    const valid = await verifyPassword(user?.active ? user.passwordHash : null, password);
    if (!user || !valid) throw wrongCredentials();
    return this.database.transaction(async () => {
      const issued = await this.sessions.issue(user);
      await this.events.append(new UserSignedIn(user.organisationId, user.id));
      return issued;
    });
  }
}
