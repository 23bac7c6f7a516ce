import { dayCloses, domainEvents, payments, users } from '@tressury/schema';
import { and, eq } from 'drizzle-orm';
import { businessDateIn } from '../../apps/api/src/common/business-date.js';
import { buildFloor, type Floor } from './support/floor-builders.js';
import { startTestApp, type TestApp } from './support/test-app.js';

type Ticket = {
  id: string;
  number: number;
  status: string;
  businessDate: string;
  serviceLines: { id: string; price: string; listPrice: string; bowls: { cost: string; ratio: string | null; developerVolume: string | null; totalGrams: string; wasteCost: string }[]; refundOfLineId: string | null; bookedOn: string }[];
  retailLines: { id: string; amount: string; tax: string }[];
  payments: { method: string; kind: string; status: string; amount: string; change: string | null }[];
  totals: { services: string; retail: string; tax: string; tips: string; total: string; paid: string; due: string };
  patchTest: { needed: boolean; acknowledgedAt: string | null };
};

describe('tickets', () => {
  let t: TestApp;
  let floor: Floor;
  const auth = async (role: Parameters<TestApp['tokenFor']>[0]) => `Bearer ${await t.tokenFor(role)}`;

  beforeAll(async () => {
    t = await startTestApp();
    floor = await buildFloor(t.database);
  });
  afterAll(() => t.close());

  async function openTicket(clientId: string | undefined = floor.clients.tested.id, branchId = floor.riverside.id): Promise<Ticket> {
    const response = await t.http().post('/api/tickets').set('Authorization', await auth('front_desk')).send({ branchId, clientId }).expect(201);
    return response.body;
  }

  async function addCut(ticket: Ticket, staffId = floor.staff.jonah.id): Promise<Ticket> {
    return (
      await t
        .http()
        .post(`/api/tickets/${ticket.id}/service-lines`)
        .set('Authorization', await auth('front_desk'))
        .send({ serviceId: floor.services.cut.id, staffId })
        .expect(201)
    ).body;
  }

  it('opens a ticket on today’s business date in the branch’s time zone, numbered per branch day', async () => {
    const first = await openTicket();
    const second = await openTicket();
    expect(first.businessDate).toBe(businessDateIn('America/Chicago'));
    expect(second.number).toBe(first.number + 1);
    expect(first.status).toBe('open');
  });

  it('prices a service at the stylist’s level and takes a discount off', async () => {
    const ticket = await openTicket();
    const withCut = await addCut(ticket, floor.staff.rhea.id);
    expect(withCut.serviceLines[0]).toMatchObject({ listPrice: '85.00', price: '85.00' });
    const line = withCut.serviceLines[0]!;
    const discounted = await t
      .http()
      .patch(`/api/tickets/${ticket.id}/service-lines/${line.id}`)
      .set('Authorization', await auth('front_desk'))
      .send({ discount: '8.50' })
      .expect(200);
    expect(discounted.body.serviceLines[0]).toMatchObject({ listPrice: '85.00', discount: '8.50', price: '76.50' });
    const moved = await t
      .http()
      .patch(`/api/tickets/${ticket.id}/service-lines/${line.id}`)
      .set('Authorization', await auth('front_desk'))
      .send({ staffId: floor.staff.jonah.id })
      .expect(200);
    expect(moved.body.serviceLines[0]).toMatchObject({ listPrice: '55.00', price: '46.50' });
  });

  it('stops colour for a client without a current patch test until the desk acknowledges the caution', async () => {
    const ticket = await openTicket(floor.clients.walkIn.id);
    const body = { serviceId: floor.services.rootColour.id, staffId: floor.staff.rhea.id };
    const refused = await t.http().post(`/api/tickets/${ticket.id}/service-lines`).set('Authorization', await auth('front_desk')).send(body).expect(409);
    expect(refused.body.code).toBe('ticket.patch_test_caution');
    expect(refused.body.message).toMatch(/48 hours/);
    const accepted = await t
      .http()
      .post(`/api/tickets/${ticket.id}/service-lines`)
      .set('Authorization', await auth('front_desk'))
      .send({ ...body, acknowledgePatchTest: true })
      .expect(201);
    expect(accepted.body.patchTest).toMatchObject({ needed: true, acknowledgedAt: expect.any(String) });
  });

  it('lets the stylist record a bowl on their colour service, costed by libs/domain', async () => {
    const ticket = await openTicket();
    const withColour = (
      await t
        .http()
        .post(`/api/tickets/${ticket.id}/service-lines`)
        .set('Authorization', await auth('front_desk'))
        .send({ serviceId: floor.services.rootColour.id, staffId: floor.staff.rhea.id })
        .expect(201)
    ).body as Ticket;
    expect(withColour.patchTest.needed).toBe(false);
    const lineId = withColour.serviceLines[0]!.id;
    const stylist = await auth('stylist');
    const response = await t
      .http()
      .post(`/api/tickets/${ticket.id}/bowls`)
      .set('Authorization', stylist)
      .send({
        serviceLineId: lineId,
        components: [
          { productId: floor.products.shade.id, amount: '2', unit: 'oz' },
          { productId: floor.products.developer20.id, amount: '56.7', unit: 'g' },
        ],
        leftoverGrams: '10',
        processingMinutes: 35,
      })
      .expect(201);
    const bowl = response.body.serviceLines[0].bowls[0];
    // 2 oz = 56.69904625 g (NIST Handbook 44, Appendix C: 1 oz = 28.349523125 g), recorded to the milligram.
    expect(bowl.totalGrams).toBe('113.399');
    // Permanent colour mixed about 1:1 with 20 volume developer (common practice in the trade).
    expect(bowl.ratio).toBe('1.00');
    expect(bowl.developerVolume).toBe('20.0');
    // 56.699 g × $0.10 + 56.7 g × $0.012 = 5.6699 + 0.6804 = 6.3503 → $6.35
    expect(bowl.cost).toBe('6.35');
    const events = await t.database.db.select().from(domainEvents).where(and(eq(domainEvents.aggregateId, ticket.id), eq(domainEvents.type, 'BowlRecorded')));
    expect(events).toHaveLength(1);
  });

  it('names the bad field of a bowl and writes nothing', async () => {
    const ticket = await openTicket();
    const withColour = (
      await t
        .http()
        .post(`/api/tickets/${ticket.id}/service-lines`)
        .set('Authorization', await auth('front_desk'))
        .send({ serviceId: floor.services.rootColour.id, staffId: floor.staff.rhea.id })
        .expect(201)
    ).body as Ticket;
    const lineId = withColour.serviceLines[0]!.id;
    const bad = await t
      .http()
      .post(`/api/tickets/${ticket.id}/bowls`)
      .set('Authorization', await auth('stylist'))
      .send({ serviceLineId: lineId, components: [{ productId: floor.products.shade.id, amount: 'lots', unit: 'g' }] })
      .expect(400);
    expect(bad.body.details.map((d: { field: string }) => d.field)).toContain('components[0].amount');
    const retailInBowl = await t
      .http()
      .post(`/api/tickets/${ticket.id}/bowls`)
      .set('Authorization', await auth('stylist'))
      .send({ serviceLineId: lineId, components: [{ productId: floor.products.shade.id, amount: '30', unit: 'g' }, { productId: floor.products.shampoo.id, amount: '5', unit: 'g' }] })
      .expect(400);
    expect(retailInBowl.body.details[0].field).toBe('components[1].productId');
    const after = await t.http().get(`/api/tickets/${ticket.id}`).set('Authorization', await auth('front_desk')).expect(200);
    expect(after.body.serviceLines[0].bowls).toEqual([]);
  });

  it('keeps a stylist to their own tickets and their own work', async () => {
    const other = await openTicket();
    await addCut(other, floor.staff.jonah.id);
    const stylist = await auth('stylist');
    await t.http().get(`/api/tickets/${other.id}`).set('Authorization', stylist).expect(404);
    const list = await t.http().get(`/api/tickets?branchId=${floor.riverside.id}`).set('Authorization', stylist).expect(200);
    expect(list.body.map((row: { id: string }) => row.id)).not.toContain(other.id);

    const mine = await openTicket();
    await addCut(mine, floor.staff.rhea.id);
    await t.http().get(`/api/tickets/${mine.id}`).set('Authorization', stylist).expect(200);
    const tip = await t.http().post(`/api/tickets/${mine.id}/tips`).set('Authorization', stylist).send({ staffId: floor.staff.rhea.id, amount: '50.00' }).expect(403);
    expect(tip.body.code).toBe('ticket.stylist_own_work_only');
    await t.http().post(`/api/tickets/${mine.id}/close`).set('Authorization', stylist).expect(403);
  });

  it('adds retail with the branch’s sales tax and tips, and closes only when fully paid in cash', async () => {
    const ticket = await openTicket();
    await addCut(ticket);
    const desk = await auth('front_desk');
    const withRetail = await t
      .http()
      .post(`/api/tickets/${ticket.id}/retail-lines`)
      .set('Authorization', desk)
      .send({ productId: floor.products.shampoo.id, quantity: 2, sellerStaffId: floor.staff.jonah.id })
      .expect(201);
    // Riverside's demo retail tax rate is 8.25 %: 48.00 × 0.0825 = 3.96.
    expect(withRetail.body.retailLines[0]).toMatchObject({ amount: '48.00', tax: '3.96' });
    const withTip = await t.http().post(`/api/tickets/${ticket.id}/tips`).set('Authorization', desk).send({ staffId: floor.staff.jonah.id, amount: '10.00' }).expect(201);
    expect(withTip.body.totals).toEqual({ services: '55.00', retail: '48.00', tax: '3.96', tips: '10.00', total: '116.96', paid: '0.00', due: '116.96' });

    const unpaid = await t.http().post(`/api/tickets/${ticket.id}/close`).set('Authorization', desk).expect(409);
    expect(unpaid.body).toMatchObject({ code: 'ticket.unpaid', message: '116.96 is still due.' });
    const tooMuch = await t
      .http()
      .post(`/api/tickets/${ticket.id}/payments`)
      .set('Authorization', desk)
      .send({ method: 'cash', amount: '200.00', idempotencyKey: 'cash-too-much-1' })
      .expect(400);
    expect(tooMuch.body.details[0].field).toBe('amount');
    const paid = await t
      .http()
      .post(`/api/tickets/${ticket.id}/payments`)
      .set('Authorization', desk)
      .send({ method: 'cash', amount: '116.96', tendered: '120.00', idempotencyKey: 'cash-exact-1' })
      .expect(201);
    expect(paid.body.payments[0]).toMatchObject({ method: 'cash', status: 'succeeded', amount: '116.96', change: '3.04' });
    const closed = await t.http().post(`/api/tickets/${ticket.id}/close`).set('Authorization', desk).expect(200);
    expect(closed.body.status).toBe('closed');
    const late = await t.http().post(`/api/tickets/${ticket.id}/tips`).set('Authorization', desk).send({ staffId: floor.staff.jonah.id, amount: '5.00' }).expect(409);
    expect(late.body.code).toBe('ticket.not_open');
  });

  it('will not close a colour service without a bowl or a reason', async () => {
    const ticket = await openTicket();
    const withColour = (
      await t
        .http()
        .post(`/api/tickets/${ticket.id}/service-lines`)
        .set('Authorization', await auth('front_desk'))
        .send({ serviceId: floor.services.rootColour.id, staffId: floor.staff.jonah.id })
        .expect(201)
    ).body as Ticket;
    const desk = await auth('front_desk');
    await t.http().post(`/api/tickets/${ticket.id}/payments`).set('Authorization', desk).send({ method: 'cash', amount: '80.00', idempotencyKey: 'cash-colour-1' }).expect(201);
    const refused = await t.http().post(`/api/tickets/${ticket.id}/close`).set('Authorization', desk).expect(409);
    expect(refused.body.code).toBe('ticket.bowls_missing');
    await t
      .http()
      .patch(`/api/tickets/${ticket.id}/service-lines/${withColour.serviceLines[0]!.id}`)
      .set('Authorization', desk)
      .send({ noProductReason: 'Client cancelled the colour after consultation' })
      .expect(200);
    await t.http().post(`/api/tickets/${ticket.id}/close`).set('Authorization', desk).expect(200);
  });

  it('charges a card once for two submissions with the same key, and records a declined card', async () => {
    const ticket = await openTicket();
    await addCut(ticket);
    const desk = await auth('front_desk');
    const declined = await t
      .http()
      .post(`/api/tickets/${ticket.id}/payments`)
      .set('Authorization', desk)
      .send({ method: 'card', amount: '55.00', paymentMethod: 'pm_card_chargeDeclined', idempotencyKey: 'card-declined-1' })
      .expect(409);
    expect(declined.body.code).toBe('payment.declined');
    const body = { method: 'card', amount: '55.00', paymentMethod: 'pm_card_visa', idempotencyKey: 'card-double-1' };
    const [first, second] = await Promise.all([
      t.http().post(`/api/tickets/${ticket.id}/payments`).set('Authorization', desk).send(body),
      t.http().post(`/api/tickets/${ticket.id}/payments`).set('Authorization', desk).send(body),
    ]);
    expect([first.status, second.status]).toEqual([201, 201]);
    const rows = await t.database.db.select().from(payments).where(eq(payments.ticketId, ticket.id));
    expect(rows.filter((p) => p.status === 'succeeded')).toHaveLength(1);
    expect(rows.filter((p) => p.status === 'failed')).toHaveLength(1);
    const reused = await t
      .http()
      .post(`/api/tickets/${ticket.id}/payments`)
      .set('Authorization', desk)
      .send({ ...body, amount: '10.00' })
      .expect(409);
    expect(reused.body).toMatchObject({ code: 'payment.key_reused', details: [{ field: 'idempotencyKey' }] });
    const closed = await t.http().post(`/api/tickets/${ticket.id}/close`).set('Authorization', desk).expect(200);
    expect(closed.body.totals).toMatchObject({ total: '55.00', paid: '55.00', due: '0.00' });
  });

  it('voids only by a manager, and only with nothing paid', async () => {
    const ticket = await openTicket();
    await addCut(ticket);
    await t.http().post(`/api/tickets/${ticket.id}/void`).set('Authorization', await auth('front_desk')).send({ reason: 'Client left' }).expect(403);
    const manager = await auth('manager');
    const voided = await t.http().post(`/api/tickets/${ticket.id}/void`).set('Authorization', manager).send({ reason: 'Client left before the service' }).expect(200);
    expect(voided.body).toMatchObject({ status: 'void', voidReason: 'Client left before the service' });

    const paid = await openTicket();
    await addCut(paid);
    await t.http().post(`/api/tickets/${paid.id}/payments`).set('Authorization', manager).send({ method: 'cash', amount: '20.00', idempotencyKey: 'cash-void-1' }).expect(201);
    const refused = await t.http().post(`/api/tickets/${paid.id}/void`).set('Authorization', manager).send({ reason: 'Mistake' }).expect(409);
    expect(refused.body.code).toBe('ticket.paid');
  });

  it('refunds a closed ticket to the card as negative lines booked today, once', async () => {
    const ticket = await openTicket();
    await addCut(ticket);
    const desk = await auth('front_desk');
    await t
      .http()
      .post(`/api/tickets/${ticket.id}/retail-lines`)
      .set('Authorization', desk)
      .send({ productId: floor.products.shampoo.id, quantity: 1, sellerStaffId: floor.staff.jonah.id })
      .expect(201);
    // 55.00 + 24.00 + 1.98 tax = 80.98
    await t.http().post(`/api/tickets/${ticket.id}/payments`).set('Authorization', desk).send({ method: 'card', amount: '80.98', paymentMethod: 'pm_card_visa', idempotencyKey: 'card-refund-1' }).expect(201);
    const closed = (await t.http().post(`/api/tickets/${ticket.id}/close`).set('Authorization', desk).expect(200)).body as Ticket;

    await t
      .http()
      .post(`/api/tickets/${ticket.id}/refunds`)
      .set('Authorization', desk)
      .send({ serviceLineIds: [closed.serviceLines[0]!.id], retail: [], method: 'card', reason: 'Unhappy with the cut', idempotencyKey: 'refund-desk-1' })
      .expect(403);
    const manager = await auth('manager');
    const refundBody = {
      serviceLineIds: [closed.serviceLines[0]!.id],
      retail: [{ retailLineId: closed.retailLines[0]!.id, quantity: 1 }],
      method: 'card',
      reason: 'Unhappy with the cut',
      idempotencyKey: 'refund-manager-1',
    };
    const refunded = (await t.http().post(`/api/tickets/${ticket.id}/refunds`).set('Authorization', manager).send(refundBody).expect(201)).body;
    const today = businessDateIn('America/Chicago');
    expect(refunded.refunded).toBe(true);
    expect(refunded.serviceLines[1]).toMatchObject({ price: '-55.00', bookedOn: today, refundOfLineId: closed.serviceLines[0]!.id });
    expect(refunded.retailLines[1]).toMatchObject({ quantity: -1, amount: '-24.00', tax: '-1.98' });
    expect(refunded.payments.at(-1)).toMatchObject({ method: 'card', kind: 'refund', status: 'succeeded', amount: '-80.98' });
    expect(refunded.totals).toMatchObject({ total: '0.00', paid: '0.00', due: '0.00' });

    const replay = await t.http().post(`/api/tickets/${ticket.id}/refunds`).set('Authorization', manager).send(refundBody).expect(201);
    expect(replay.body.payments).toHaveLength(2);
    const again = await t
      .http()
      .post(`/api/tickets/${ticket.id}/refunds`)
      .set('Authorization', manager)
      .send({ ...refundBody, retail: [], idempotencyKey: 'refund-manager-2' })
      .expect(400);
    expect(again.body.details[0].field).toBe('serviceLineIds[0]');
  });

  it('locks a closed day: no ticket opens or changes on it', async () => {
    // Front desk works at Riverside only: Old Mill does not exist for them.
    await t.http().post('/api/tickets').set('Authorization', await auth('front_desk')).send({ branchId: floor.oldMill.id }).expect(404);
    const manager = await auth('manager');
    const open = (await t.http().post('/api/tickets').set('Authorization', manager).send({ branchId: floor.oldMill.id }).expect(201)).body as Ticket;
    const [owner] = await t.database.db.select().from(users).where(eq(users.role, 'owner'));
    await t.database.db.insert(dayCloses).values({
      organisationId: floor.organisationId,
      branchId: floor.oldMill.id,
      businessDate: open.businessDate,
      expectedCash: '0',
      countedCash: '0',
      cashVariance: '0',
      cardTotalTickets: '0',
      cardTotalProcessor: '0',
      cardVariance: '0',
      closedById: owner!.id,
    });
    const change = await t
      .http()
      .post(`/api/tickets/${open.id}/service-lines`)
      .set('Authorization', manager)
      .send({ serviceId: floor.services.cut.id, staffId: floor.staff.milla.id })
      .expect(409);
    expect(change.body.code).toBe('day.locked');
    expect(change.body.message).toMatch(/dated adjustments/);
    const reopen = await t.http().post('/api/tickets').set('Authorization', manager).send({ branchId: floor.oldMill.id }).expect(409);
    expect(reopen.body.code).toBe('day.locked');
  });

  it('lets the accountant read tickets but never change them', async () => {
    const ticket = await openTicket();
    const accountant = await auth('accountant');
    await t.http().get(`/api/tickets/${ticket.id}`).set('Authorization', accountant).expect(200);
    await t.http().post(`/api/tickets/${ticket.id}/service-lines`).set('Authorization', accountant).send({ serviceId: floor.services.cut.id, staffId: floor.staff.jonah.id }).expect(403);
    await t.http().post('/api/tickets').set('Authorization', accountant).send({ branchId: floor.riverside.id }).expect(403);
  });
});
