import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { demoBusiness, DEMO_PASSWORD } from '@tressury/fixtures';
import { branches, domainEvents, organisations, userBranches, users } from '@tressury/schema';
import { hashPassword } from '../auth/passwords.js';
import type { AppConfig } from '../config.js';
import { Database } from '../database/database.js';

/** Loads the invented demo business into an empty database; a database with any organisation is left alone. */
@Injectable()
export class DemoSeeder implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoSeeder');

  constructor(
    private readonly database: Database,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (this.config.get('seedDemo', { infer: true })) await this.seedIfEmpty();
  }

  async seedIfEmpty(): Promise<boolean> {
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const seeded = await this.database.transaction(async () => {
      const db = this.database.db;
      const existing = await db.select({ id: organisations.id }).from(organisations).limit(1);
      if (existing.length > 0) return false;
      const [organisation] = await db.insert(organisations).values({ name: demoBusiness.organisationName }).returning();
      const organisationId = organisation!.id;
      const branchRows = await db
        .insert(branches)
        .values(demoBusiness.branches.map(({ key: _key, ...branch }) => ({ ...branch, organisationId })))
        .returning();
      const branchIdByKey = new Map(demoBusiness.branches.map((branch, i) => [branch.key, branchRows[i]!.id]));
      for (const user of demoBusiness.users) {
        const [row] = await db
          .insert(users)
          .values({ organisationId, email: user.email, displayName: user.displayName, role: user.role, passwordHash })
          .returning();
        if (user.branchKeys.length > 0) {
          await db.insert(userBranches).values(user.branchKeys.map((key) => ({ userId: row!.id, branchId: branchIdByKey.get(key)! })));
        }
      }
      await db.insert(domainEvents).values({
        organisationId,
        type: 'DemoBusinessLoaded',
        aggregateType: 'Organisation',
        aggregateId: organisationId,
        actorId: null,
        payload: { branches: branchRows.length, users: demoBusiness.users.length },
      });
      return true;
    });
    if (seeded) this.logger.log(`Loaded the demo business "${demoBusiness.organisationName}"`);
    return seeded;
  }
}
