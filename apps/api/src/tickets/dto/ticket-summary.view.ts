import { ApiProperty } from '@nestjs/swagger';

/** One row of a branch day's ticket list. */
export class TicketSummaryView {
  id: string;
  number: number;
  businessDate: string;
  @ApiProperty({ enum: ['open', 'closed', 'void'] })
  status: 'open' | 'closed' | 'void';
  clientName: string | null;
  /** The stylists on the ticket, by name. */
  staffNames: string[];
  services: string;
  total: string;
  paid: string;
  due: string;
  /** Colour services still waiting for a bowl or a no-product reason. */
  colourLinesWithoutBowl: number;
  openedAt: string;
  locked: boolean;
}
