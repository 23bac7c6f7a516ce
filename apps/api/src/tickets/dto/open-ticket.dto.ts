import { IsOptional, IsUUID } from 'class-validator';

export class OpenTicketDto {
  /** The branch the client is in; the ticket takes today's business date in its time zone. */
  @IsUUID()
  branchId: string;

  /** Left out for a walk-in with no client record. */
  @IsOptional()
  @IsUUID()
  clientId?: string;
}
