import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { migrationsFolder } from '@tressury/schema';
import { sql } from 'drizzle-orm';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Public } from '../auth/public.decorator.js';
import { Database } from '../database/database.js';
import { HealthView } from './health.view.js';

type Journal = { entries: { tag: string; when: number }[] };

@ApiTags('health')
@Controller('health')
export class HealthController {
  private readonly journal: Journal = JSON.parse(readFileSync(join(migrationsFolder, 'meta', '_journal.json'), 'utf8')) as Journal;

  constructor(private readonly database: Database) {}

  @Public()
  @Get()
  async health(): Promise<HealthView> {
    const result = await this.database.db.execute<{ created_at: string }>(
      sql`select created_at from drizzle.__drizzle_migrations order by created_at desc limit 1`,
    );
    const rows = (Array.isArray(result) ? result : (result as { rows: { created_at: string }[] }).rows) as { created_at: string }[];
    const appliedAt = rows[0] ? Number(rows[0].created_at) : null;
    const migration = this.journal.entries.find((entry) => entry.when === appliedAt)?.tag ?? null;
    return { status: 'ok', database: this.database.engine, migration };
  }
}
