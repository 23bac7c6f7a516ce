import { Module } from '@nestjs/common';
import { ClientsController } from './clients.controller.js';
import { ClientsRepository } from './clients.repository.js';
import { CreateClientHandler } from './commands/create-client.handler.js';
import { UpdateClientHandler } from './commands/update-client.handler.js';
import { GetClientHandler } from './queries/get-client.handler.js';
import { ListClientFormulasHandler } from './queries/list-client-formulas.handler.js';
import { ListClientsHandler } from './queries/list-clients.handler.js';

@Module({
  controllers: [ClientsController],
  providers: [ClientsRepository, CreateClientHandler, UpdateClientHandler, GetClientHandler, ListClientsHandler, ListClientFormulasHandler],
})
export class ClientsModule {}
