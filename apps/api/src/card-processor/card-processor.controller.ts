import { Controller, Headers, HttpCode, Post, type RawBodyRequest, Req } from '@nestjs/common';
import { CommandBus } from '@nestjs/cqrs';
import { ApiExcludeController } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../auth/public.decorator.js';
import { ReceiveProcessorEventCommand } from './commands/receive-processor-event.command.js';
import type { ProcessorEventReceipt } from './dto/processor-event-receipt.view.js';

/** Called by the card processor, not by people: no token; the event's signature is its credential. */
@ApiExcludeController()
@Controller('card-processor')
export class CardProcessorController {
  constructor(private readonly commands: CommandBus) {}

  @Public()
  @Post('webhook')
  @HttpCode(200)
  receive(@Req() request: RawBodyRequest<Request>, @Headers('stripe-signature') signature?: string): Promise<ProcessorEventReceipt> {
    return this.commands.execute(new ReceiveProcessorEventCommand(request.rawBody, signature));
  }
}
