import { ApiProperty } from '@nestjs/swagger';

export class HealthView {
  @ApiProperty({ enum: ['ok'] })
  status: 'ok';
  @ApiProperty({ enum: ['pglite', 'postgres'] })
  database: 'pglite' | 'postgres';
  /** The tag of the newest applied drizzle-kit migration. */
  migration: string | null;
}
