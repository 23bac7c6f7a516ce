import { Module } from '@nestjs/common';
import { BranchesController } from './branches.controller.js';
import { BranchesRepository } from './branches.repository.js';
import { CreateBranchHandler } from './commands/create-branch.handler.js';
import { UpdateBranchHandler } from './commands/update-branch.handler.js';
import { GetBranchHandler } from './queries/get-branch.handler.js';
import { ListBranchesHandler } from './queries/list-branches.handler.js';

@Module({
  controllers: [BranchesController],
  providers: [BranchesRepository, CreateBranchHandler, UpdateBranchHandler, ListBranchesHandler, GetBranchHandler],
})
export class BranchesModule {}
