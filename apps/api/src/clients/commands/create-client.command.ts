import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ClientDetailView } from '../dto/client.view.js';
import type { CreateClientDto } from '../dto/create-client.dto.js';

export class CreateClientCommand extends Command<ClientDetailView> {
  constructor(
    readonly user: AuthUser,
    readonly input: CreateClientDto,
  ) {
    super();
  }
}
