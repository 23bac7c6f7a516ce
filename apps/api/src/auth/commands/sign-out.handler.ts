import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { Database } from '../../database/database.js';
import { EventLog } from '../../events/event-log.js';
import { AuthRepository } from '../auth.repository.js';
import { UserSignedOut } from '../events/user-signed-out.js';
import { hashRefreshToken } from '../session-issuer.js';
import { SignOutCommand } from './sign-out.command.js';

@CommandHandler(SignOutCommand)
export class SignOutHandler implements ICommandHandler<SignOutCommand> {
  constructor(
    private readonly database: Database,
    private readonly repository: AuthRepository,
    private readonly events: EventLog,
  ) {}

  /** Ends the refresh chain behind the cookie; the short-lived access token simply runs out. */
  async execute({ refreshToken }: SignOutCommand): Promise<void> {
    if (!refreshToken) return;
    await this.database.transaction(async () => {
      const token = await this.repository.findRefreshToken(hashRefreshToken(refreshToken));
      if (!token || token.revokedAt) return;
      await this.repository.revokeFamily(token.familyId, new Date());
      const user = await this.repository.findUser(token.userId);
      if (user) await this.events.append(new UserSignedOut(user.organisationId, user.id));
    });
  }
}
