import { Injectable } from '@nestjs/common';
import { branches, organisations, refreshTokens, type RefreshTokenRow, userBranches, users, type UserRow } from '@tressury/schema';
import { and, asc, eq, isNull } from 'drizzle-orm';
import { Database } from '../database/database.js';

@Injectable()
export class AuthRepository {
  constructor(private readonly database: Database) {}

  async findUserByEmail(email: string): Promise<UserRow | null> {
    const [row] = await this.database.db.select().from(users).where(eq(users.email, email.toLowerCase()));
    return row ?? null;
  }

  async findUser(id: string): Promise<UserRow | null> {
    const [row] = await this.database.db.select().from(users).where(eq(users.id, id));
    return row ?? null;
  }

  async organisationName(id: string): Promise<string> {
    const [row] = await this.database.db.select({ name: organisations.name }).from(organisations).where(eq(organisations.id, id));
    return row?.name ?? '';
  }

  /** Owners and accountants work across every branch of the organisation; the others where assigned. */
  async branchesOf(user: UserRow) {
    const columns = { id: branches.id, name: branches.name, timeZone: branches.timeZone, currency: branches.currency };
    if (user.role === 'owner' || user.role === 'accountant') {
      return this.database.db.select(columns).from(branches).where(eq(branches.organisationId, user.organisationId)).orderBy(asc(branches.name));
    }
    return this.database.db
      .select(columns)
      .from(userBranches)
      .innerJoin(branches, eq(branches.id, userBranches.branchId))
      .where(and(eq(userBranches.userId, user.id), eq(branches.organisationId, user.organisationId)))
      .orderBy(asc(branches.name));
  }

  async insertRefreshToken(token: typeof refreshTokens.$inferInsert): Promise<void> {
    await this.database.db.insert(refreshTokens).values(token);
  }

  async findRefreshToken(tokenHash: string): Promise<RefreshTokenRow | null> {
    const [row] = await this.database.db.select().from(refreshTokens).where(eq(refreshTokens.tokenHash, tokenHash)).for('update');
    return row ?? null;
  }

  async markRefreshTokenUsed(id: string, at: Date): Promise<void> {
    await this.database.db.update(refreshTokens).set({ usedAt: at }).where(eq(refreshTokens.id, id));
  }

  async revokeFamily(familyId: string, at: Date): Promise<void> {
    await this.database.db
      .update(refreshTokens)
      .set({ revokedAt: at })
      .where(and(eq(refreshTokens.familyId, familyId), isNull(refreshTokens.revokedAt)));
  }
}
