import { type IQueryHandler, QueryHandler } from '@nestjs/cqrs';
import { sessionEnded } from '../auth-errors.js';
import { AuthRepository } from '../auth.repository.js';
import type { MeView } from '../dto/me.view.js';
import { SessionIssuer } from '../session-issuer.js';
import { GetMeQuery } from './get-me.query.js';

@QueryHandler(GetMeQuery)
export class GetMeHandler implements IQueryHandler<GetMeQuery> {
  constructor(
    private readonly repository: AuthRepository,
    private readonly sessions: SessionIssuer,
  ) {}

  async execute({ user }: GetMeQuery): Promise<MeView> {
    const row = await this.repository.findUser(user.id);
    if (!row?.active) throw sessionEnded();
    return (await this.sessions.describe(row)).me;
  }
}
