import { Command } from '@nestjs/cqrs';
import type { IssuedSession } from '../session-issuer.js';

export class RefreshSessionCommand extends Command<IssuedSession> {
  constructor(readonly refreshToken: string | undefined) {
    super();
  }
}
