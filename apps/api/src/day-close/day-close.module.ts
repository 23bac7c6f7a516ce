import { Module } from '@nestjs/common';
import { AddAdjustmentHandler } from './commands/add-adjustment.handler.js';
import { CloseDayHandler } from './commands/close-day.handler.js';
import { DayCloseController } from './day-close.controller.js';
import { DayCloseRepository } from './day-close.repository.js';
import { DayFiguresQuery } from './day-figures.js';
import { DayPreview } from './day-preview.js';
import { GetDayPreviewHandler } from './queries/get-day-preview.handler.js';

@Module({
  controllers: [DayCloseController],
  providers: [DayCloseRepository, DayFiguresQuery, DayPreview, CloseDayHandler, AddAdjustmentHandler, GetDayPreviewHandler],
})
export class DayCloseModule {}
