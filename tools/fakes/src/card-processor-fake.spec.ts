import { createServer, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { type CardProcessorFake, startCardProcessorFake } from './card-processor-fake.js';

const secretKey = 'sk_test_fake_spec';
const webhookSecret = 'whsec_fake_spec';

type Received = { body: string; signature: string };

/** A webhook receiver that answers with the given statuses in turn (then 200), recording every delivery. */
async function startReceiver(statuses: number[] = []): Promise<{ url: string; received: Received[]; server: Server }> {
  const received: Received[] = [];
  const server = createServer((req: IncomingMessage, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      received.push({ body: Buffer.concat(chunks).toString('utf8'), signature: String(req.headers['stripe-signature']) });
      res.writeHead(statuses.shift() ?? 200).end();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return { url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/hook`, received, server };
}

async function until<T>(read: () => T | undefined, timeoutMs = 5000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = read();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error('timed out waiting');
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

describe('card processor fake, driven through the stripe SDK', () => {
  let fake: CardProcessorFake;
  let stripe: Stripe;
  let clock = Date.UTC(2026, 2, 10, 15, 0, 0);
  const servers: Server[] = [];

  beforeEach(async () => {
    clock = Date.UTC(2026, 2, 10, 15, 0, 0);
    fake = await startCardProcessorFake({ secretKey, webhookSecret, now: () => clock, webhookRetryDelaysMs: [20, 20] });
    stripe = new Stripe(secretKey, { host: fake.host, port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
  });

  afterEach(async () => {
    await fake.stop();
    for (const server of servers.splice(0)) await new Promise((resolve) => server.close(resolve));
  });

  it('creates a PaymentIntent and confirms it with a card that succeeds', async () => {
    const created = await stripe.paymentIntents.create({ amount: 4250, currency: 'usd', metadata: { branchId: 'b-1' }, allowed_payment_method_types: ['card'] });
    expect(created.status).toBe('requires_payment_method');

    const confirmed = await stripe.paymentIntents.confirm(created.id, { payment_method: 'pm_card_visa' });
    expect(confirmed).toMatchObject({ id: created.id, status: 'succeeded', amount: 4250, amount_received: 4250, currency: 'usd', metadata: { branchId: 'b-1' } });

    const retrieved = await stripe.paymentIntents.retrieve(created.id, { expand: ['latest_charge'] });
    const charge = retrieved.latest_charge as Stripe.Charge;
    expect(charge).toMatchObject({ object: 'charge', status: 'succeeded', amount: 4250, amount_captured: 4250, payment_intent: created.id });
  });

  it('charges in one call with confirm: true', async () => {
    const intent = await stripe.paymentIntents.create({ amount: 1999, currency: 'usd', payment_method: 'pm_card_visa', confirm: true });
    expect(intent.status).toBe('succeeded');
  });

  it('declines the documented declining test card with the SDK’s StripeCardError', async () => {
    const attempt = stripe.paymentIntents.create({ amount: 5000, currency: 'usd', payment_method: 'pm_card_chargeDeclined', confirm: true });
    const error = await attempt.catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(Stripe.errors.StripeCardError);
    const cardError = error as Stripe.errors.StripeCardError;
    expect(cardError).toMatchObject({ code: 'card_declined', decline_code: 'generic_decline', statusCode: 402 });
    const intentId = (cardError.payment_intent as Stripe.PaymentIntent).id;

    const intent = await stripe.paymentIntents.retrieve(intentId);
    expect(intent.status).toBe('requires_payment_method');
    expect(intent.last_payment_error).toMatchObject({ type: 'card_error', code: 'card_declined' });
    const charges = await stripe.charges.list({ payment_intent: intentId });
    expect(charges.data.map((charge) => charge.status)).toEqual(['failed']);
  });

  it('replays a request sent twice with one idempotency key: the same intent and a single charge', async () => {
    const params = { amount: 3000, currency: 'usd', payment_method: 'pm_card_visa', confirm: true, metadata: { ticketId: 't-1' } };
    const first = await stripe.paymentIntents.create(params, { idempotencyKey: 'ticket-t-1-payment-1' });
    const second = await stripe.paymentIntents.create(params, { idempotencyKey: 'ticket-t-1-payment-1' });

    expect(second.id).toBe(first.id);
    expect(second.lastResponse.headers['idempotent-replayed']).toBe('true');
    const charges = await stripe.charges.list({ limit: 100 });
    expect(charges.data).toHaveLength(1);
  });

  it('refuses one idempotency key with different parameters', async () => {
    await stripe.paymentIntents.create({ amount: 3000, currency: 'usd' }, { idempotencyKey: 'k-1' });
    const error = await stripe.paymentIntents.create({ amount: 3100, currency: 'usd' }, { idempotencyKey: 'k-1' }).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
  });

  it('replays a declined charge for its key rather than charging again', async () => {
    const params = { amount: 700, currency: 'usd', payment_method: 'pm_card_chargeDeclined', confirm: true };
    const first = (await stripe.paymentIntents.create(params, { idempotencyKey: 'd-1' }).catch((e: unknown) => e)) as Stripe.errors.StripeCardError;
    const second = (await stripe.paymentIntents.create(params, { idempotencyKey: 'd-1' }).catch((e: unknown) => e)) as Stripe.errors.StripeCardError;
    expect(second).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect((second.payment_intent as Stripe.PaymentIntent).id).toBe((first.payment_intent as Stripe.PaymentIntent).id);
    expect((await stripe.charges.list()).data).toHaveLength(1);
  });

  it('refunds part and then the rest of a payment, and no more than what remains', async () => {
    const intent = await stripe.paymentIntents.create({ amount: 10000, currency: 'usd', payment_method: 'pm_card_visa', confirm: true });
    const part = await stripe.refunds.create({ payment_intent: intent.id, amount: 2500 });
    expect(part).toMatchObject({ object: 'refund', amount: 2500, status: 'succeeded', payment_intent: intent.id });

    const tooMuch = await stripe.refunds.create({ payment_intent: intent.id, amount: 7501 }).catch((e: unknown) => e);
    expect(tooMuch).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(tooMuch).toMatchObject({ code: 'amount_too_large', param: 'amount' });

    const rest = await stripe.refunds.create({ payment_intent: intent.id });
    expect(rest.amount).toBe(7500);
    const charge = (await stripe.charges.list({ payment_intent: intent.id })).data[0]!;
    expect(charge).toMatchObject({ amount_refunded: 10000, refunded: true });
    const again = await stripe.refunds.create({ payment_intent: intent.id, amount: 1 }).catch((e: unknown) => e);
    expect(again).toMatchObject({ code: 'charge_already_refunded' });
  });

  it('lists one day’s charges newest first, page by page', async () => {
    const dayStart = Date.UTC(2026, 2, 10, 5, 0, 0);
    const dayEnd = Date.UTC(2026, 2, 11, 5, 0, 0);
    const charge = async (at: number, amount: number) => {
      clock = at;
      await stripe.paymentIntents.create({ amount, currency: 'usd', payment_method: 'pm_card_visa', confirm: true });
    };
    await charge(dayStart - 1000, 51); // the evening before
    for (let i = 0; i < 5; i++) await charge(dayStart + i * 3_600_000, 100 + i);
    await charge(dayEnd, 52); // the next day's first second

    const window = { gte: dayStart / 1000, lt: dayEnd / 1000 };
    const first = await stripe.charges.list({ created: window, limit: 2 });
    expect(first.data.map((c) => c.amount)).toEqual([104, 103]);
    expect(first.has_more).toBe(true);
    const second = await stripe.charges.list({ created: window, limit: 2, starting_after: first.data[1]!.id });
    expect(second.data.map((c) => c.amount)).toEqual([102, 101]);
    const all = await stripe.charges.list({ created: window, limit: 2 }).autoPagingToArray({ limit: 100 });
    expect(all.map((c) => c.amount)).toEqual([104, 103, 102, 101, 100]);
  });

  it('expands the PaymentIntent of each listed charge', async () => {
    await stripe.paymentIntents.create({ amount: 800, currency: 'usd', payment_method: 'pm_card_visa', confirm: true, metadata: { branchId: 'b-9' } });
    const [charge] = (await stripe.charges.list({ expand: ['data.payment_intent'] })).data;
    expect((charge!.payment_intent as Stripe.PaymentIntent).metadata).toEqual({ branchId: 'b-9' });
  });

  it('answers a wrong secret key with the SDK’s authentication error', async () => {
    const stranger = new Stripe('sk_test_someone_else', { host: fake.host, port: fake.port, protocol: 'http', maxNetworkRetries: 0 });
    const error = await stranger.paymentIntents.create({ amount: 100, currency: 'usd' }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
  });

  it('names an unknown parameter, and an amount under the $0.50 minimum the SDK documents', async () => {
    const unknown = await stripe.paymentIntents.create({ amount: 100, currency: 'usd', customer: 'cus_1' }).catch((e: unknown) => e);
    expect(unknown).toMatchObject({ type: 'StripeInvalidRequestError', code: 'parameter_unknown', param: 'customer' });
    const small = await stripe.paymentIntents.create({ amount: 49, currency: 'usd' }).catch((e: unknown) => e);
    expect(small).toMatchObject({ type: 'StripeInvalidRequestError', code: 'amount_too_small', param: 'amount' });
  });

  it('sends signed events that the SDK’s own check accepts, and that fail it once altered', async () => {
    const receiver = await startReceiver();
    servers.push(receiver.server);
    fake.setWebhookUrl(receiver.url);

    const paid = await stripe.paymentIntents.create({ amount: 6000, currency: 'usd', payment_method: 'pm_card_visa', confirm: true });
    await stripe.paymentIntents.create({ amount: 100, currency: 'usd', payment_method: 'pm_card_chargeDeclined', confirm: true }).catch(() => null);
    await stripe.refunds.create({ payment_intent: paid.id, amount: 1000 });

    await until(() => (receiver.received.length >= 3 ? true : undefined));
    const events = receiver.received.map(({ body, signature }) => stripe.webhooks.constructEvent(body, signature, webhookSecret));
    expect(events.map((event) => event.type).sort()).toEqual(['charge.refunded', 'payment_intent.payment_failed', 'payment_intent.succeeded']);
    const succeeded = events.find((event) => event.type === 'payment_intent.succeeded') as Stripe.PaymentIntentSucceededEvent;
    expect(succeeded.data.object).toMatchObject({ id: paid.id, status: 'succeeded' });
    const refunded = events.find((event) => event.type === 'charge.refunded') as Stripe.ChargeRefundedEvent;
    expect(refunded.data.object).toMatchObject({ payment_intent: paid.id, amount_refunded: 1000 });

    const { body, signature } = receiver.received[0]!;
    expect(() => stripe.webhooks.constructEvent(body.replace('"livemode": false', '"livemode": true'), signature, webhookSecret)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() => stripe.webhooks.constructEvent(body, signature, 'whsec_another')).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it('retries a delivery the receiver failed, and resends an event on request', async () => {
    const receiver = await startReceiver([500, 503]);
    servers.push(receiver.server);
    fake.setWebhookUrl(receiver.url);
    await stripe.paymentIntents.create({ amount: 100, currency: 'usd', payment_method: 'pm_card_visa', confirm: true });

    await until(() => (receiver.received.length === 3 ? true : undefined));
    const ids = receiver.received.map(({ body, signature }) => stripe.webhooks.constructEvent(body, signature, webhookSecret).id);
    expect(new Set(ids).size).toBe(1);

    expect(await fake.resend(ids[0]!)).toBe(200);
    expect(receiver.received).toHaveLength(4);
  });

  it('answers the API call without waiting for a receiver that never replies', async () => {
    const silent = createServer(() => undefined);
    await new Promise<void>((resolve) => silent.listen(0, '127.0.0.1', resolve));
    servers.push(silent);
    fake.setWebhookUrl(`http://127.0.0.1:${(silent.address() as AddressInfo).port}/`);

    const started = Date.now();
    const intent = await stripe.paymentIntents.create({ amount: 100, currency: 'usd', payment_method: 'pm_card_visa', confirm: true });
    expect(intent.status).toBe('succeeded');
    expect(Date.now() - started).toBeLessThan(1000);
    silent.closeAllConnections();
  });
});
