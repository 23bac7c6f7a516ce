import { Global, Module } from '@nestjs/common';
import { CardProcessor } from './card-processor.js';
import { CardProcessorController } from './card-processor.controller.js';
import { ReceiveProcessorEventHandler } from './commands/receive-processor-event.handler.js';
import { ProcessorEventsRepository } from './processor-events.repository.js';

/** Global so the tickets and day-close handlers can inject CardProcessor without importing this module. */
@Global()
@Module({
  controllers: [CardProcessorController],
  providers: [CardProcessor, ProcessorEventsRepository, ReceiveProcessorEventHandler],
  exports: [CardProcessor],
})
export class CardProcessorModule {}
