import { Test } from '@nestjs/testing';
import { CommandBus, EventBus } from '@nestjs/cqrs';
import { branches, domainEvents, users } from '@tressury/schema';
import { eq } from 'drizzle-orm';
import type { AuthUser } from '../../auth/auth-user.js';
import { AppModule } from '../../app.module.js';
import { Database } from '../../database/database.js';
import { BranchCreated } from '../events/branch-created.js';
import { CreateBranchCommand } from './create-branch.command.js';

describe('CreateBranchHandler on the real bus and PGlite', () => {
  let bus: CommandBus;
  let database: Database;
  let eventBus: EventBus;
  let owner: AuthUser;
  let close: () => Promise<void>;

  beforeAll(async () => {
    const moduleRef = await Test.createTestingModule({
      imports: [AppModule.register({ TRESSURY_DATA_DIR: 'memory://create-branch-spec', TRESSURY_SEED_DEMO: 'basic' })],
    }).compile();
    const app = moduleRef.createNestApplication({ logger: ['error'] });
    await app.init();
    close = () => app.close();
    bus = app.get(CommandBus);
    database = app.get(Database);
    eventBus = app.get(EventBus);
    const [row] = await database.db.select().from(users).where(eq(users.role, 'owner'));
    owner = { id: row!.id, organisationId: row!.organisationId, role: 'owner', branchIds: [], staffId: null };
  });
  afterAll(() => close());

  it('writes the branch and its event together and publishes the event only after commit', async () => {
    const published: { event: unknown; duringTransaction: boolean }[] = [];
    const subscription = eventBus.subscribe((event) => published.push({ event, duringTransaction: database.inTransaction }));
    const view = await bus.execute(new CreateBranchCommand(owner, { name: 'Fernbrook', timeZone: 'America/Denver' }));
    subscription.unsubscribe();
    const [event] = await database.db.select().from(domainEvents).where(eq(domainEvents.aggregateId, view.id));
    expect(event).toMatchObject({ type: 'BranchCreated', actorId: owner.id, organisationId: owner.organisationId });
    expect(published).toHaveLength(1);
    expect(published[0]!.event).toBeInstanceOf(BranchCreated);
    expect(published[0]!.duringTransaction).toBe(false);
  });

  it('leaves neither the row nor the event behind when the transaction fails', async () => {
    await expect(
      database.transaction(async () => {
        await database.db.insert(branches).values({
          organisationId: owner.organisationId,
          name: 'Half-written',
          timeZone: 'UTC',
          currency: 'USD',
          minimumWage: '7.25',
          overtimeAfterHours: '40',
          overtimeMultiplier: '1.5',
          retailTaxRate: '0',
        });
        throw new Error('boom');
      }),
    ).rejects.toThrow('boom');
    expect(await database.db.select().from(branches).where(eq(branches.name, 'Half-written'))).toEqual([]);
  });
});
