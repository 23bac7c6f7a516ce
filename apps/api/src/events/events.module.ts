import { Global, Module } from '@nestjs/common';
import { EventLog } from './event-log.js';

@Global()
@Module({ providers: [EventLog], exports: [EventLog] })
export class EventsModule {}
