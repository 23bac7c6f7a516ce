import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { Database } from '../../database/database.js';
import { sessionEnded } from '../auth-errors.js';
import { AuthRepository } from '../auth.repository.js';
import { hashRefreshToken, type IssuedSession, SessionIssuer } from '../session-issuer.js';
import { RefreshSessionCommand } from './refresh-session.command.js';

// Two tabs refreshing at once present the same token; a second use this soon is that, not theft.
const REUSE_GRACE_MS = 10_000;

@CommandHandler(RefreshSessionCommand)
export class RefreshSessionHandler implements ICommandHandler<RefreshSessionCommand> {
  constructor(
    private readonly database: Database,
    private readonly repository: AuthRepository,
    private readonly sessions: SessionIssuer,
  ) {}

  async execute({ refreshToken }: RefreshSessionCommand): Promise<IssuedSession> {
    if (!refreshToken) throw sessionEnded();
    const outcome = await this.database.transaction(async () => {
      const now = new Date();
      const token = await this.repository.findRefreshToken(hashRefreshToken(refreshToken));
      if (!token || token.revokedAt || token.expiresAt <= now) return null;
      if (token.usedAt && now.getTime() - token.usedAt.getTime() > REUSE_GRACE_MS) {
        // A used token presented again later: someone holds a copy, so the whole chain ends.
        await this.repository.revokeFamily(token.familyId, now);
        return 'revoked' as const;
      }
      const user = await this.repository.findUser(token.userId);
      if (!user?.active) return null;
      if (!token.usedAt) await this.repository.markRefreshTokenUsed(token.id, now);
      return this.sessions.issue(user, token.familyId);
    });
    if (outcome === null || outcome === 'revoked') throw sessionEnded();
    return outcome;
  }
}
