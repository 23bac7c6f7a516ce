import { Command } from '@nestjs/cqrs';
import type { AuthUser } from '../../auth/auth-user.js';
import type { UpdateServiceDto } from '../dto/update-service.dto.js';
import type { ServiceView } from '../dto/service.view.js';

export class UpdateServiceCommand extends Command<ServiceView> {
  constructor(
    readonly user: AuthUser,
    readonly serviceId: string,
    readonly changes: UpdateServiceDto,
  ) {
    super();
  }
}
