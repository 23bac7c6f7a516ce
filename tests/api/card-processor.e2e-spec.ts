import { ConfigService } from '@nestjs/config';
import { EventBus } from '@nestjs/cqrs';
import { DomainError } from '@tressury/domain';
import type { CardProcessorFake } from '@tressury/fakes';
import { processorEvents } from '@tressury/schema';
import { eq, inArray } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import Stripe from 'stripe';
import { CardProcessor, WEBHOOK_PATH } from '../../apps/api/src/card-processor/card-processor.js';
import { CardPaymentSettled } from '../../apps/api/src/card-processor/events/card-payment-settled.js';
import { CardRefundSettled } from '../../apps/api/src/card-processor/events/card-refund-settled.js';
import type { AppConfig } from '../../apps/api/src/config.js';
import { startTestApp, type TestApp } from './support/test-app.js';

async function eventually<T>(read: () => Promise<T | undefined> | T | undefined, timeoutMs = 8000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error('timed out waiting');
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}

/** Waits until the wall clock (which the fake stamps charges with, in whole seconds) enters a new second. */
async function nextSecond(): Promise<number> {
  const current = Math.floor(Date.now() / 1000);
  await eventually(() => (Math.floor(Date.now() / 1000) > current ? true : undefined));
  return Math.floor(Date.now() / 1000) * 1000;
}

describe('card processor: the stripe SDK against the local fake, and its signed webhooks', () => {
  let t: TestApp;
  let processor: CardProcessor;
  let fake: CardProcessorFake;
  let sdk: Stripe;
  let webhookSecret: string;
  const published: unknown[] = [];

  const rowsFor = (ids: string[]) => t.database.db.select().from(processorEvents).where(inArray(processorEvents.id, ids));
  const raisedFor = (type: string, objectId: string) =>
    fake.events().find((event) => event.type === type && (event.data.object as { id: string }).id === objectId);
  const settledPayment = (id: string) => published.filter((e): e is CardPaymentSettled => e instanceof CardPaymentSettled && e.processorPaymentId === id);

  beforeAll(async () => {
    t = await startTestApp();
    // Real delivery needs a listening server: the fake is pointed at it when app.listen() runs.
    await t.app.listen(0, '127.0.0.1');
    processor = t.app.get(CardProcessor);
    fake = processor.fake!;
    const settings = t.app.get(ConfigService<AppConfig, true>).get('cardProcessor', { infer: true });
    webhookSecret = settings.webhookSecret;
    sdk = new Stripe(settings.secretKey, { host: fake.host, port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
    t.app.get(EventBus).subscribe((event) => published.push(event));
  });
  afterAll(() => t.close());

  it('starts the fake in fake mode with a generated test key', () => {
    expect(fake).not.toBeNull();
    expect(fake.host).toBe('127.0.0.1');
  });

  it('charges a card, and the fake’s signed event reaches the webhook and settles the payment', async () => {
    const branchId = randomUUID();
    const result = await processor.charge({
      amount: '42.50',
      currency: 'USD',
      paymentMethod: 'pm_card_visa',
      idempotencyKey: `charge-${randomUUID()}`,
      metadata: { branchId, ticketId: 'ticket-1' },
    });
    expect(result).toEqual({ processorPaymentId: expect.stringMatching(/^pi_/), status: 'succeeded' });

    const event = raisedFor('payment_intent.succeeded', result.processorPaymentId)!;
    const [row] = await eventually(async () => {
      const rows = await rowsFor([event.id]);
      return rows.length > 0 ? rows : undefined;
    });
    expect(row).toMatchObject({ id: event.id, type: 'payment_intent.succeeded' });
    const settled = await eventually(() => settledPayment(result.processorPaymentId)[0]);
    expect(settled).toMatchObject({ status: 'succeeded', amount: '42.50', currency: 'USD', metadata: { branchId, ticketId: 'ticket-1' }, processorEventId: event.id });
  });

  it('returns a declined card as a failed result with a plain message, and settles it as failed', async () => {
    const result = await processor.charge({ amount: '18.00', currency: 'USD', paymentMethod: 'pm_card_chargeDeclined', idempotencyKey: `charge-${randomUUID()}` });
    expect(result).toEqual({ processorPaymentId: expect.stringMatching(/^pi_/), status: 'failed', message: 'The card was declined.' });
    const settled = await eventually(() => settledPayment(result.processorPaymentId)[0]);
    expect(settled).toMatchObject({ status: 'failed', amount: '18.00', message: 'The card was declined.' });
  });

  it('charges once for two submissions with the same idempotency key', async () => {
    const attempt = { amount: '65.00', currency: 'USD', paymentMethod: 'pm_card_visa', idempotencyKey: `ticket-x:checkout-${randomUUID()}` };
    const [first, second] = await Promise.all([processor.charge(attempt), processor.charge(attempt)]);
    const third = await processor.charge(attempt);

    expect(second.processorPaymentId).toBe(first.processorPaymentId);
    expect(third.processorPaymentId).toBe(first.processorPaymentId);
    const charges = await sdk.charges.list({ payment_intent: first.processorPaymentId });
    expect(charges.data).toHaveLength(1);
    expect(charges.data[0]).toMatchObject({ amount: 6500, status: 'succeeded' });
  });

  it('refuses the same idempotency key for a different amount, with a conflict', async () => {
    const key = `ticket-y:checkout-${randomUUID()}`;
    await processor.charge({ amount: '20.00', currency: 'USD', paymentMethod: 'pm_card_visa', idempotencyKey: key });
    const error = await processor.charge({ amount: '21.00', currency: 'USD', paymentMethod: 'pm_card_visa', idempotencyKey: key }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(DomainError);
    expect(error).toMatchObject({ code: 'card_processor.attempt_reused', kind: 'conflict' });
  });

  it('refuses an amount with more decimals than the currency has, naming the field, before any charge', async () => {
    const branchId = randomUUID();
    const error = await processor
      .charge({ amount: '10.005', currency: 'USD', paymentMethod: 'pm_card_visa', idempotencyKey: `c-${randomUUID()}`, metadata: { branchId } })
      .catch((e: unknown) => e);
    expect(error).toMatchObject({ code: 'card_processor.amount_precision', field: 'amount' });
    const all = await sdk.charges.list({ limit: 100, expand: ['data.payment_intent'] }).autoPagingToArray({ limit: 10_000 });
    expect(all.filter((charge) => (charge.payment_intent as Stripe.PaymentIntent).metadata.branchId === branchId)).toHaveLength(0);
  });

  it('refunds part of a payment, settles the refund from the webhook, and refuses more than what remains', async () => {
    const payment = await processor.charge({ amount: '80.00', currency: 'USD', paymentMethod: 'pm_card_visa', idempotencyKey: `c-${randomUUID()}` });
    const refund = await processor.refund({ processorPaymentId: payment.processorPaymentId, amount: '30.00', idempotencyKey: `r-${randomUUID()}` });
    expect(refund).toEqual({ processorRefundId: expect.stringMatching(/^re_/), status: 'succeeded' });

    const settled = await eventually(() =>
      published.find((e): e is CardRefundSettled => e instanceof CardRefundSettled && e.processorRefundId === refund.processorRefundId),
    );
    expect(settled).toMatchObject({ processorPaymentId: payment.processorPaymentId, amount: '30.00', currency: 'USD', status: 'succeeded' });

    const tooMuch = await processor
      .refund({ processorPaymentId: payment.processorPaymentId, amount: '50.01', idempotencyKey: `r-${randomUUID()}` })
      .catch((e: unknown) => e);
    expect(tooMuch).toMatchObject({ code: 'card_processor.refund_too_large', kind: 'invalid', field: 'amount' });
    const missing = await processor.refund({ processorPaymentId: 'pi_nothing', amount: '1.00', idempotencyKey: `r-${randomUUID()}` }).catch((e: unknown) => e);
    expect(missing).toMatchObject({ code: 'card_processor.payment_not_found', kind: 'not_found' });
  });

  describe('the webhook endpoint', () => {
    const forgedEvent = (id: string) =>
      JSON.stringify({
        id,
        object: 'event',
        type: 'payment_intent.succeeded',
        created: Math.floor(Date.now() / 1000),
        livemode: false,
        data: { object: { id: `pi_${id}`, object: 'payment_intent', amount: 100000, amount_received: 100000, currency: 'usd', metadata: {}, status: 'succeeded' } },
      });
    const post = (payload: string, signature?: string) => {
      const request = t.http().post(WEBHOOK_PATH).set('content-type', 'application/json');
      return (signature ? request.set('stripe-signature', signature) : request).send(payload);
    };

    it('rejects a forged, altered or unsigned event with 400 and writes nothing', async () => {
      const ids = [`evt_forged_${randomUUID()}`, `evt_altered_${randomUUID()}`, `evt_unsigned_${randomUUID()}`];
      const forged = forgedEvent(ids[0]!);
      const wrongSecret = Stripe.webhooks.generateTestHeaderString({ payload: forged, secret: 'whsec_not_ours' });
      const genuine = forgedEvent(ids[1]!);
      const signedGenuine = Stripe.webhooks.generateTestHeaderString({ payload: genuine, secret: webhookSecret });
      const altered = genuine.replace('100000', '900000');

      for (const response of [await post(forged, wrongSecret), await post(altered, signedGenuine), await post(forgedEvent(ids[2]!))]) {
        expect(response.status).toBe(400);
        expect(response.body).toMatchObject({ code: 'card_processor.bad_signature' });
      }
      expect(await rowsFor(ids)).toHaveLength(0);
      expect(published.filter((e) => e instanceof CardPaymentSettled && ids.includes(e.processorEventId))).toHaveLength(0);

      // The same body with its true signature is accepted: the 400s above come from the signature check alone.
      const accepted = await post(genuine, signedGenuine);
      expect(accepted.status).toBe(200);
      expect(await rowsFor([ids[1]!])).toHaveLength(1);
    });

    it('needs no sign-in: the signature is the credential', async () => {
      const payload = forgedEvent(`evt_public_${randomUUID()}`);
      const response = await post(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret }));
      expect(response.status).toBe(200);
    });

    it('applies a redelivered event once', async () => {
      const payment = await processor.charge({ amount: '12.00', currency: 'USD', paymentMethod: 'pm_card_visa', idempotencyKey: `c-${randomUUID()}` });
      const event = raisedFor('payment_intent.succeeded', payment.processorPaymentId)!;
      await eventually(async () => ((await rowsFor([event.id])).length > 0 ? true : undefined));

      expect(await fake.resend(event.id)).toBe(200);
      const payload = JSON.stringify(event);
      const again = await post(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret }));
      expect(again.status).toBe(200);
      expect(again.body).toEqual({ received: true, duplicate: true });

      expect(await rowsFor([event.id])).toHaveLength(1);
      expect(settledPayment(payment.processorPaymentId)).toHaveLength(1);
    });

    it('settles a refund whose status the processor updates later', async () => {
      const id = `evt_refund_update_${randomUUID()}`;
      const refund = { id: `re_${randomUUID()}`, object: 'refund', amount: 1250, currency: 'usd', payment_intent: 'pi_earlier', status: 'failed' };
      const payload = JSON.stringify({ id, object: 'event', type: 'charge.refund.updated', created: 1, livemode: false, data: { object: refund } });
      const response = await post(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret }));
      expect(response.status).toBe(200);
      const settled = await eventually(() => published.find((e): e is CardRefundSettled => e instanceof CardRefundSettled && e.processorEventId === id));
      expect(settled).toMatchObject({ processorPaymentId: 'pi_earlier', processorRefundId: refund.id, amount: '12.50', currency: 'USD', status: 'failed' });
    });

    it('records an event it has no use for without publishing anything', async () => {
      const id = `evt_other_${randomUUID()}`;
      const payload = JSON.stringify({ id, object: 'event', type: 'customer.created', created: 1, livemode: false, data: { object: { id: 'cus_1', object: 'customer' } } });
      const response = await post(payload, Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret }));
      expect(response.body).toEqual({ received: true, duplicate: false });
      const [row] = await t.database.db.select().from(processorEvents).where(eq(processorEvents.id, id));
      expect(row).toMatchObject({ type: 'customer.created' });
    });
  });

  describe('cardTotalBetween', () => {
    const pay = (branchId: string, amount: string, paymentMethod = 'pm_card_visa', currency = 'USD') =>
      processor.charge({ amount, currency, paymentMethod, idempotencyKey: `c-${randomUUID()}`, metadata: { branchId } });

    it('adds the window’s succeeded charges and takes off the window’s refunds, for one branch and currency only', async () => {
      const branchId = randomUUID();
      const before = await pay(branchId, '10.00');

      const from = await nextSecond();
      await pay(branchId, '25.00');
      const refunded = await pay(branchId, '40.00');
      await pay(branchId, '99.00', 'pm_card_chargeDeclined');
      await pay(randomUUID(), '55.00'); // another branch
      await pay(branchId, '33.00', 'pm_card_visa', 'EUR'); // another currency
      await processor.refund({ processorPaymentId: refunded.processorPaymentId, amount: '15.00', idempotencyKey: `r-${randomUUID()}` });
      // Refunded inside the window although charged before it: the refund counts on the day it is made.
      await processor.refund({ processorPaymentId: before.processorPaymentId, amount: '3.00', idempotencyKey: `r-${randomUUID()}` });

      const to = await nextSecond();
      const after = await pay(branchId, '7.00');
      await processor.refund({ processorPaymentId: after.processorPaymentId, amount: '7.00', idempotencyKey: `r-${randomUUID()}` });

      // 25.00 + 40.00 - 15.00 - 3.00
      expect(await processor.cardTotalBetween({ from: new Date(from), to: new Date(to), currency: 'USD', metadata: { branchId } })).toBe('47.00');
      expect(await processor.cardTotalBetween({ from: new Date(from), to: new Date(to), currency: 'EUR', metadata: { branchId } })).toBe('33.00');
      expect(await processor.cardTotalBetween({ from: new Date(to), to: new Date(to + 60_000), currency: 'USD', metadata: { branchId } })).toBe('0.00');
    });

    it('reads every page of a busy day', async () => {
      const branchId = randomUUID();
      const from = new Date(Date.now() - 1000);
      for (let i = 0; i < 105; i++) await pay(branchId, '0.50');
      const to = new Date(Date.now() + 2000);
      // 105 × 0.50 = 52.50: more than the 100 charges of one page.
      expect(await processor.cardTotalBetween({ from, to, currency: 'USD', metadata: { branchId } })).toBe('52.50');
    });
  });
});
