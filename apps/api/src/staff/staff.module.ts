import { Module } from '@nestjs/common';
import { CreateStaffHandler } from './commands/create-staff.handler.js';
import { UpdateStaffHandler } from './commands/update-staff.handler.js';
import { GetStaffHandler } from './queries/get-staff.handler.js';
import { ListStaffHandler } from './queries/list-staff.handler.js';
import { StaffController } from './staff.controller.js';
import { StaffRepository } from './staff.repository.js';

@Module({
  controllers: [StaffController],
  providers: [StaffRepository, CreateStaffHandler, UpdateStaffHandler, ListStaffHandler, GetStaffHandler],
})
export class StaffModule {}
