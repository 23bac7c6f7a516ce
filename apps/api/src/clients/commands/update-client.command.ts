import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { ClientDetailView } from '../dto/client.view.js';
import type { UpdateClientDto } from '../dto/update-client.dto.js';

export class UpdateClientCommand extends Command<ClientDetailView> {
  constructor(
    readonly user: AuthUser,
    readonly clientId: string,
    readonly changes: UpdateClientDto,
  ) {
    super();
  }
}
