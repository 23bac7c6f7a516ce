import { Command } from '@nestjs/cqrs';
import type { IssuedSession } from '../session-issuer.js';

export class SignInCommand extends Command<IssuedSession> {
  constructor(
    readonly email: string,
    readonly password: string,
  ) {
    super();
  }
}
