import { randomBytes } from 'node:crypto';
import { type ClientRequest, createServer, type IncomingMessage, request as httpRequest, type ServerResponse } from 'node:http';
import { request as httpsRequest } from 'node:https';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { type FormObject, FormSyntaxError, type FormValue, parseBracketedForm } from './bracketed-form.js';

export type CardProcessorFakeOptions = {
  /** 0 (the default) takes any free port. */
  port?: number;
  secretKey: string;
  webhookSecret: string;
  /** The fake's clock in epoch milliseconds; tests move it to create charges on other days. */
  now?: () => number;
  /** Pause before each webhook retry; the processor itself backs off over hours. */
  webhookRetryDelaysMs?: number[];
};

export type CardProcessorFake = {
  host: '127.0.0.1';
  port: number;
  /** Where signed events go; null keeps them undelivered. */
  setWebhookUrl(url: string | null): void;
  /** Every event raised so far, oldest first, as its JSON body was signed. */
  events(): Stripe.Event[];
  /** Sends an event again with a fresh signature, as the processor does when asked to resend one. */
  resend(eventId: string): Promise<number>;
  stop(): Promise<void>;
};

type PaymentIntentRecord = Pick<
  Stripe.PaymentIntent,
  | 'id'
  | 'object'
  | 'allowed_payment_method_types'
  | 'amount'
  | 'amount_capturable'
  | 'amount_received'
  | 'capture_method'
  | 'client_secret'
  | 'confirmation_method'
  | 'created'
  | 'currency'
  | 'description'
  | 'last_payment_error'
  | 'latest_charge'
  | 'livemode'
  | 'metadata'
  | 'payment_method'
  | 'payment_method_types'
  | 'status'
>;
type ChargeRecord = Pick<
  Stripe.Charge,
  | 'id'
  | 'object'
  | 'amount'
  | 'amount_captured'
  | 'amount_refunded'
  | 'captured'
  | 'created'
  | 'currency'
  | 'description'
  | 'failure_code'
  | 'failure_message'
  | 'livemode'
  | 'metadata'
  | 'paid'
  | 'payment_intent'
  | 'payment_method'
  | 'refunded'
  | 'status'
>;
type RefundRecord = Pick<
  Stripe.Refund,
  'id' | 'object' | 'amount' | 'charge' | 'created' | 'currency' | 'metadata' | 'payment_intent' | 'reason' | 'status'
>;
type ApiObject = PaymentIntentRecord | ChargeRecord | RefundRecord;
type EventType = 'payment_intent.succeeded' | 'payment_intent.payment_failed' | 'charge.refunded';

type ErrorFields = {
  type: 'invalid_request_error' | 'card_error' | 'idempotency_error' | 'api_error';
  message: string;
  code?: string;
  param?: string;
  decline_code?: string;
  charge?: string;
  payment_intent?: unknown;
};

/** An error answer; `settled` ones ran the operation and are replayed for their idempotency key like a success. */
class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly fields: ErrorFields,
    readonly settled = false,
  ) {
    super(fields.message);
  }
}

type Outcome = { status: number; body: unknown; events: { type: EventType; object: ApiObject; previous?: Record<string, unknown> }[] };

type TestCard = { outcome: 'succeeds' } | { outcome: 'declines'; code: string; declineCode: string; message: string };

// The processor's documented test payment methods (test-mode docs, from memory); unknown ids are refused like a missing object.
const TEST_CARDS: Record<string, TestCard> = {
  pm_card_visa: { outcome: 'succeeds' },
  pm_card_mastercard: { outcome: 'succeeds' },
  pm_card_chargeDeclined: { outcome: 'declines', code: 'card_declined', declineCode: 'generic_decline', message: 'Your card was declined.' },
  pm_card_chargeDeclinedInsufficientFunds: {
    outcome: 'declines',
    code: 'card_declined',
    declineCode: 'insufficient_funds',
    message: 'Your card has insufficient funds.',
  },
  pm_card_chargeDeclinedExpiredCard: { outcome: 'declines', code: 'expired_card', declineCode: 'expired_card', message: 'Your card has expired.' },
};

const DEFAULT_RETRY_DELAYS_MS = [200, 1000];

/**
 * A local stand-in for the card processor: the subset of its REST API that the stripe SDK sends for card
 * payments (PaymentIntents, Refunds, listing charges), with API-key auth, idempotency keys and signed webhooks.
 * State lives in memory and is gone when it stops. Listens on 127.0.0.1 only.
 */
export async function startCardProcessorFake(options: CardProcessorFakeOptions): Promise<CardProcessorFake> {
  const now = options.now ?? Date.now;
  const retryDelays = options.webhookRetryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS;
  const paymentIntents = new Map<string, PaymentIntentRecord>();
  const charges = new Map<string, ChargeRecord>();
  const refunds = new Map<string, RefundRecord>();
  const idempotent = new Map<string, { fingerprint: string; status: number; body: string }>();
  const sentEvents: { event: Stripe.Event; payload: string }[] = [];
  const timers = new Set<NodeJS.Timeout>();
  const inFlight = new Set<ClientRequest>();
  let webhookUrl: string | null = null;
  let stopped = false;
  /** Events raised by a request that ends in a settled error (a declined card still notifies). */
  let deferredEvents: Outcome['events'] = [];
  let sequence = 0;
  const order = new Map<string, number>();

  const seconds = () => Math.floor(now() / 1000);
  const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString('hex')}`;
  const remember = <T extends ApiObject>(map: Map<string, T>, record: T): T => {
    map.set(record.id, record);
    order.set(record.id, ++sequence);
    return record;
  };
  const snapshot = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

  function lookup(id: string): ApiObject | undefined {
    return paymentIntents.get(id) ?? charges.get(id) ?? refunds.get(id);
  }

  // ---- routes -------------------------------------------------------------------------------------------

  function createPaymentIntent(params: FormObject): Outcome {
    allowOnly(params, ['amount', 'currency', 'metadata', 'payment_method', 'allowed_payment_method_types', 'confirm', 'description', 'capture_method', 'expand']);
    const amount = positiveInteger(params.amount, 'amount', true)!;
    const currency = currencyCode(params.currency);
    // The SDK's PaymentIntent.amount doc: at least $0.50 US (other currencies' minimums are not modelled).
    if (currency === 'usd' && amount < 50) throw invalid('Amount must be at least $0.50 usd', 'amount', 'amount_too_small');
    const metadata = metadataOf(params.metadata);
    const paymentMethod = optionalString(params.payment_method, 'payment_method');
    const confirm = booleanOf(params.confirm, 'confirm');
    const allowed = params.allowed_payment_method_types === undefined ? null : stringList(params.allowed_payment_method_types, 'allowed_payment_method_types');
    if (allowed?.some((type) => type !== 'card')) {
      throw invalid('This fake accepts card payments only.', 'allowed_payment_method_types', 'parameter_invalid_string');
    }
    if (params.capture_method !== undefined && params.capture_method !== 'automatic') {
      throw invalid('This fake captures automatically only.', 'capture_method', 'parameter_invalid_string');
    }
    if (confirm) testCard(paymentMethod);
    const id = newId('pi');
    const intent = remember(paymentIntents, {
      id,
      object: 'payment_intent',
      allowed_payment_method_types: allowed as Stripe.PaymentIntent.AllowedPaymentMethodType[] | null,
      amount,
      amount_capturable: 0,
      amount_received: 0,
      capture_method: 'automatic',
      client_secret: `${id}_secret_${randomBytes(12).toString('hex')}`,
      confirmation_method: 'automatic',
      created: seconds(),
      currency,
      description: optionalString(params.description, 'description') ?? null,
      last_payment_error: null,
      latest_charge: null,
      livemode: false,
      metadata,
      payment_method: paymentMethod ?? null,
      payment_method_types: ['card'],
      status: paymentMethod ? 'requires_confirmation' : 'requires_payment_method',
    });
    if (confirm) return confirmPaymentIntent(intent, params.payment_method, params.expand);
    return { status: 200, body: expand(intent, params.expand), events: [] };
  }

  function confirmPaymentIntent(intent: PaymentIntentRecord, paymentMethodParam: FormValue | undefined, expandParam: FormValue | undefined): Outcome {
    if (intent.status !== 'requires_payment_method' && intent.status !== 'requires_confirmation') {
      throw invalid(
        `You cannot confirm this PaymentIntent because it has a status of ${intent.status}.`,
        undefined,
        'payment_intent_unexpected_state',
      );
    }
    const paymentMethod = optionalString(paymentMethodParam, 'payment_method') ?? (intent.payment_method as string | null) ?? undefined;
    const card = testCard(paymentMethod);
    const charge = remember(charges, {
      id: newId('ch'),
      object: 'charge',
      amount: intent.amount,
      amount_captured: card.outcome === 'succeeds' ? intent.amount : 0,
      amount_refunded: 0,
      captured: card.outcome === 'succeeds',
      created: seconds(),
      currency: intent.currency,
      description: intent.description,
      failure_code: card.outcome === 'declines' ? card.code : null,
      failure_message: card.outcome === 'declines' ? card.message : null,
      livemode: false,
      metadata: {},
      paid: card.outcome === 'succeeds',
      payment_intent: intent.id,
      payment_method: paymentMethod ?? null,
      refunded: false,
      status: card.outcome === 'succeeds' ? 'succeeded' : 'failed',
    });
    intent.latest_charge = charge.id;

    if (card.outcome === 'succeeds') {
      Object.assign(intent, { status: 'succeeded', amount_received: intent.amount, payment_method: paymentMethod ?? null, last_payment_error: null });
      return { status: 200, body: expand(intent, expandParam), events: [{ type: 'payment_intent.succeeded', object: intent }] };
    }
    const decline = { type: 'card_error' as const, code: card.code, decline_code: card.declineCode, message: card.message, charge: charge.id };
    Object.assign(intent, { status: 'requires_payment_method', payment_method: null, last_payment_error: decline });
    deferredEvents.push({ type: 'payment_intent.payment_failed', object: intent });
    throw new ApiError(402, { ...decline, payment_intent: snapshot(intent) }, true);
  }

  function createRefund(params: FormObject): Outcome {
    allowOnly(params, ['payment_intent', 'charge', 'amount', 'metadata', 'reason', 'expand']);
    const intentId = optionalString(params.payment_intent, 'payment_intent');
    const chargeId = optionalString(params.charge, 'charge');
    if (!intentId && !chargeId) throw invalid('One of `charge` or `payment_intent` is required.', 'payment_intent', 'parameter_missing');
    let charge: ChargeRecord | undefined;
    if (chargeId) {
      charge = charges.get(chargeId);
      if (!charge) throw invalid(`No such charge: '${chargeId}'`, 'charge', 'resource_missing');
    } else {
      const intent = paymentIntents.get(intentId!);
      if (!intent) throw invalid(`No such payment_intent: '${intentId}'`, 'payment_intent', 'resource_missing');
      charge = intent.latest_charge ? charges.get(intent.latest_charge as string) : undefined;
    }
    if (!charge || charge.status !== 'succeeded') {
      throw invalid('This PaymentIntent does not have a successful charge to refund.', 'payment_intent', 'charge_not_refundable');
    }
    const remaining = charge.amount_captured - charge.amount_refunded;
    if (remaining === 0) throw invalid(`Charge ${charge.id} has already been refunded.`, undefined, 'charge_already_refunded');
    const amount = positiveInteger(params.amount, 'amount', false) ?? remaining;
    if (amount > remaining) {
      throw invalid(
        `Refund amount (${amount} ${charge.currency} minor units) is greater than unrefunded amount on charge (${remaining}).`,
        'amount',
        'amount_too_large',
      );
    }
    const reason = optionalString(params.reason, 'reason');
    if (reason && !['duplicate', 'fraudulent', 'requested_by_customer'].includes(reason)) {
      throw invalid(`Invalid reason: must be one of duplicate, fraudulent, or requested_by_customer`, 'reason', 'parameter_invalid_string');
    }
    const refund = remember(refunds, {
      id: newId('re'),
      object: 'refund',
      amount,
      charge: charge.id,
      created: seconds(),
      currency: charge.currency,
      metadata: metadataOf(params.metadata),
      payment_intent: charge.payment_intent,
      reason: (reason ?? null) as Stripe.Refund.Reason | null,
      status: 'succeeded',
    });
    const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded === charge.amount_captured;
    return { status: 200, body: expand(refund, params.expand), events: [{ type: 'charge.refunded', object: charge, previous }] };
  }

  function list<T extends ApiObject>(records: Map<string, T>, url: string, params: FormObject, filters: (keyof T & string)[]): Outcome {
    allowOnly(params, ['created', 'limit', 'starting_after', 'ending_before', 'expand', ...filters]);
    const limit = params.limit === undefined ? 10 : positiveInteger(params.limit, 'limit', true)!;
    if (limit > 100) throw invalid('This value must be less than or equal to 100.', 'limit', 'parameter_invalid_integer');
    const created = createdRange(params.created);
    const wanted = filters.flatMap((field) => (params[field] === undefined ? [] : [[field, optionalString(params[field], field)] as const]));
    const all = [...records.values()]
      .filter((record) => created(record.created) && wanted.every(([field, value]) => record[field] === value))
      .sort((a, b) => b.created - a.created || order.get(b.id)! - order.get(a.id)!);
    let page: T[];
    let hasMore: boolean;
    const after = optionalString(params.starting_after, 'starting_after');
    const before = optionalString(params.ending_before, 'ending_before');
    if (after) {
      const from = cursorIndex(all, after, 'starting_after');
      page = all.slice(from + 1, from + 1 + limit);
      hasMore = from + 1 + limit < all.length;
    } else if (before) {
      const to = cursorIndex(all, before, 'ending_before');
      page = all.slice(Math.max(0, to - limit), to);
      hasMore = to - limit > 0;
    } else {
      page = all.slice(0, limit);
      hasMore = limit < all.length;
    }
    return { status: 200, body: expand({ object: 'list', data: page, has_more: hasMore, url }, params.expand), events: [] };
  }

  function cursorIndex(records: ApiObject[], id: string, param: string): number {
    const index = records.findIndex((record) => record.id === id);
    if (index < 0) throw invalid(`No such object: '${id}'`, param, 'resource_missing');
    return index;
  }

  function expand(value: object, paths: FormValue | undefined): unknown {
    const copy = snapshot(value) as Record<string, unknown>;
    for (const path of paths === undefined ? [] : stringList(paths, 'expand')) expandPath(copy, path.split('.'), path);
    return copy;
  }

  function expandPath(node: unknown, path: string[], whole: string): void {
    if (Array.isArray(node)) return node.forEach((item) => expandPath(item, path, whole));
    if (!node || typeof node !== 'object') return;
    const [head, ...rest] = path as [string, ...string[]];
    const target = node as Record<string, unknown>;
    if (rest.length > 0) return expandPath(target[head], rest, whole);
    const value = target[head];
    if (value === null) return;
    const found = typeof value === 'string' ? lookup(value) : undefined;
    if (!found) throw invalid(`This property cannot be expanded (${whole}).`, 'expand', 'parameter_invalid_string');
    target[head] = snapshot(found);
  }

  function route(method: string, path: string, params: FormObject): Outcome {
    const intentMatch = /^\/v1\/payment_intents\/([^/]+)(\/confirm)?$/.exec(path);
    if (method === 'POST' && path === '/v1/payment_intents') return createPaymentIntent(params);
    if (intentMatch) {
      const intent = paymentIntents.get(intentMatch[1]!);
      if (!intent) throw invalid(`No such payment_intent: '${intentMatch[1]}'`, 'intent', 'resource_missing', 404);
      if (method === 'POST' && intentMatch[2]) {
        allowOnly(params, ['payment_method', 'expand']);
        return confirmPaymentIntent(intent, params.payment_method, params.expand);
      }
      if (method === 'GET' && !intentMatch[2]) {
        allowOnly(params, ['expand']);
        return { status: 200, body: expand(intent, params.expand), events: [] };
      }
    }
    if (method === 'POST' && path === '/v1/refunds') return createRefund(params);
    if (method === 'GET' && path === '/v1/refunds') return list(refunds, path, params, ['charge', 'payment_intent']);
    if (method === 'GET' && path === '/v1/charges') return list(charges, path, params, ['payment_intent']);
    throw invalid(`Unrecognized request URL (${method}: ${path}). This fake serves PaymentIntents, Refunds and the charge list.`, undefined, undefined, 404);
  }

  // ---- HTTP ---------------------------------------------------------------------------------------------

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const body = await readBody(req);
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    const method = req.method ?? 'GET';
    const requestId = newId('req');
    res.setHeader('request-id', requestId);
    const auth = req.headers.authorization ?? '';
    if (auth !== `Bearer ${options.secretKey}`) {
      const shown = auth.startsWith('Bearer ') ? `${auth.slice(7, 15)}****` : 'none';
      return send(res, 401, { error: { type: 'invalid_request_error', code: 'api_key_invalid', message: `Invalid API Key provided: ${shown}` } });
    }
    const key = method === 'POST' ? (headerValue(req.headers['idempotency-key']) ?? null) : null;
    let params: FormObject;
    try {
      params = parseBracketedForm(method === 'POST' ? body : url.search.slice(1));
    } catch (error) {
      const param = error instanceof FormSyntaxError ? error.param : undefined;
      return send(res, 400, { error: { type: 'invalid_request_error', message: `Invalid request parameter ${param ?? ''}`.trim(), param } });
    }

    // Nothing awaits from here to the reply, so two requests with one key cannot both run.
    let fingerprint = '';
    if (key !== null) {
      if (key.length > 255) {
        return send(res, 400, { error: { type: 'invalid_request_error', message: 'Idempotency keys must be at most 255 characters long.' } });
      }
      fingerprint = `${method} ${url.pathname} ${canonical(params)}`;
      const stored = idempotent.get(key);
      if (stored && stored.fingerprint !== fingerprint) {
        return send(res, 400, {
          error: {
            type: 'idempotency_error',
            message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
          },
        });
      }
      if (stored) {
        res.setHeader('idempotent-replayed', 'true');
        res.setHeader('idempotency-key', key);
        return sendRaw(res, stored.status, stored.body);
      }
    }

    let outcome: Outcome;
    deferredEvents = [];
    try {
      outcome = route(method, url.pathname, params);
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      outcome = { status: error.status, body: { error: error.fields }, events: deferredEvents };
      if (!error.settled) {
        return sendRaw(res, outcome.status, JSON.stringify(outcome.body));
      }
    }
    const text = JSON.stringify(outcome.body);
    if (key !== null) {
      idempotent.set(key, { fingerprint, status: outcome.status, body: text });
      res.setHeader('idempotency-key', key);
    }
    sendRaw(res, outcome.status, text);
    for (const raised of outcome.events) raise(raised.type, raised.object, raised.previous, requestId, key);
  }

  // ---- webhooks -----------------------------------------------------------------------------------------

  function raise(type: EventType, object: ApiObject, previous: Record<string, unknown> | undefined, requestId: string, key: string | null): void {
    const event = {
      id: newId('evt'),
      object: 'event',
      api_version: Stripe.API_VERSION,
      created: seconds(),
      data: previous ? { object: snapshot(object), previous_attributes: previous } : { object: snapshot(object) },
      livemode: false,
      pending_webhooks: webhookUrl ? 1 : 0,
      request: { id: requestId, idempotency_key: key },
      type,
    } as unknown as Stripe.Event;
    const payload = JSON.stringify(event, null, 2);
    sentEvents.push({ event, payload });
    if (webhookUrl) later(0, () => void deliver(payload, 0));
  }

  function later(ms: number, work: () => void): void {
    if (stopped) return;
    const timer = setTimeout(() => {
      timers.delete(timer);
      work();
    }, ms);
    timers.add(timer);
  }

  /** Posts one event; failures are retried in the background and never reach the API call that raised it. */
  async function deliver(payload: string, attempt: number): Promise<number> {
    const status = await post(payload);
    const delay = retryDelays[attempt];
    if ((status < 200 || status >= 300) && delay !== undefined && !stopped) later(delay, () => void deliver(payload, attempt + 1));
    return status;
  }

  function post(payload: string): Promise<number> {
    if (!webhookUrl || stopped) return Promise.resolve(0);
    const target = new URL(webhookUrl);
    // Each attempt is signed afresh, so its timestamp stays within the receiver's tolerance.
    const signature = Stripe.webhooks.generateTestHeaderString({ payload, secret: options.webhookSecret });
    const send = target.protocol === 'https:' ? httpsRequest : httpRequest;
    return new Promise((resolve) => {
      const request = send(
        target,
        {
          method: 'POST',
          agent: false,
          timeout: 10_000,
          headers: {
            'content-type': 'application/json; charset=utf-8',
            'content-length': Buffer.byteLength(payload),
            'stripe-signature': signature,
            'user-agent': 'tressury-card-processor-fake',
          },
        },
        (response) => {
          response.resume();
          response.on('end', () => resolve(response.statusCode ?? 0));
          response.on('error', () => resolve(0));
        },
      );
      inFlight.add(request);
      request.on('close', () => inFlight.delete(request));
      request.on('timeout', () => request.destroy());
      request.on('error', () => resolve(0));
      request.end(payload);
    });
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((error: unknown) => {
      if (!res.headersSent) send(res, 500, { error: { type: 'api_error', message: `The fake failed: ${String(error)}` } });
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => resolve());
  });
  const port = (server.address() as AddressInfo).port;

  return {
    host: '127.0.0.1',
    port,
    setWebhookUrl(url) {
      webhookUrl = url;
    },
    events: () => sentEvents.map((sent) => snapshot(sent.event)),
    async resend(eventId) {
      const sent = sentEvents.find((candidate) => candidate.event.id === eventId);
      if (!sent) throw new Error(`No event ${eventId} was raised`);
      return post(sent.payload);
    },
    async stop() {
      if (stopped) return;
      stopped = true;
      for (const timer of timers) clearTimeout(timer);
      timers.clear();
      for (const request of inFlight) request.destroy();
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
    },
  };
}

function testCard(paymentMethod: string | undefined): TestCard {
  if (!paymentMethod) {
    throw invalid("You cannot confirm this PaymentIntent because it's missing a payment method.", 'payment_method', 'payment_intent_unexpected_state');
  }
  const card = TEST_CARDS[paymentMethod];
  if (!card) throw invalid(`No such PaymentMethod: '${paymentMethod}'`, 'payment_method', 'resource_missing');
  return card;
}

// ---- parameters -----------------------------------------------------------------------------------------

function invalid(message: string, param?: string, code?: string, status = 400): ApiError {
  return new ApiError(status, { type: 'invalid_request_error', message, ...(code ? { code } : {}), ...(param ? { param } : {}) });
}

function allowOnly(params: FormObject, allowed: string[]): void {
  const unknown = Object.keys(params).find((key) => !allowed.includes(key));
  if (unknown) throw invalid(`Received unknown parameter: ${unknown}`, unknown, 'parameter_unknown');
}

function optionalString(value: FormValue | undefined, param: string): string | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== 'string') throw invalid(`Invalid string: ${param}`, param, 'parameter_invalid_string');
  return value;
}

function positiveInteger(value: FormValue | undefined, param: string, required: boolean): number | undefined {
  if (value === undefined) {
    if (required) throw invalid(`Missing required param: ${param}.`, param, 'parameter_missing');
    return undefined;
  }
  if (typeof value !== 'string' || !/^\d{1,12}$/.test(value) || Number(value) < 1) {
    throw invalid(`Invalid positive integer: ${param}`, param, 'parameter_invalid_integer');
  }
  return Number(value);
}

function currencyCode(value: FormValue | undefined): string {
  if (value === undefined) throw invalid('Missing required param: currency.', 'currency', 'parameter_missing');
  if (typeof value !== 'string' || !/^[a-zA-Z]{3}$/.test(value)) throw invalid(`Invalid currency: ${String(value)}`, 'currency', 'parameter_invalid_string');
  return value.toLowerCase();
}

function booleanOf(value: FormValue | undefined, param: string): boolean {
  if (value === undefined || value === 'false') return false;
  if (value === 'true') return true;
  throw invalid(`Invalid boolean: ${String(value)}`, param, 'parameter_invalid_boolean');
}

function stringList(value: FormValue, param: string): string[] {
  if (!Array.isArray(value) || value.some((item) => typeof item !== 'string')) throw invalid(`Invalid array: ${param}`, param, 'parameter_invalid_array');
  return value as string[];
}

// Metadata limits as the processor documents them: 50 keys, keys up to 40 characters, values up to 500.
function metadataOf(value: FormValue | undefined): Stripe.Metadata {
  if (value === undefined || value === '') return {};
  if (typeof value !== 'object' || Array.isArray(value)) throw invalid('Invalid metadata: must be an object', 'metadata', 'parameter_invalid_string');
  const entries = Object.entries(value);
  if (entries.length > 50) throw invalid('Invalid metadata: at most 50 keys', 'metadata', 'parameter_invalid_string');
  const metadata: Stripe.Metadata = {};
  for (const [key, item] of entries) {
    if (typeof item !== 'string' || key.length > 40 || item.length > 500) {
      throw invalid(`Invalid metadata[${key}]`, `metadata[${key}]`, 'parameter_invalid_string');
    }
    metadata[key] = item;
  }
  return metadata;
}

function createdRange(value: FormValue | undefined): (created: number) => boolean {
  if (value === undefined) return () => true;
  const integer = (raw: FormValue | undefined, param: string) => {
    if (raw === undefined) return undefined;
    if (typeof raw !== 'string' || !/^\d+$/.test(raw)) throw invalid(`Invalid integer: ${param}`, param, 'parameter_invalid_integer');
    return Number(raw);
  };
  if (typeof value === 'string') {
    const exact = integer(value, 'created')!;
    return (created) => created === exact;
  }
  if (Array.isArray(value)) throw invalid('Invalid created', 'created', 'parameter_invalid_integer');
  const unknown = Object.keys(value).find((key) => !['gt', 'gte', 'lt', 'lte'].includes(key));
  if (unknown) throw invalid(`Received unknown parameter: created[${unknown}]`, `created[${unknown}]`, 'parameter_unknown');
  const gt = integer(value.gt, 'created[gt]');
  const gte = integer(value.gte, 'created[gte]');
  const lt = integer(value.lt, 'created[lt]');
  const lte = integer(value.lte, 'created[lte]');
  return (created) =>
    (gt === undefined || created > gt) && (gte === undefined || created >= gte) && (lt === undefined || created < lt) && (lte === undefined || created <= lte);
}

/** Parameters in a stable order, so a replay with the same values in another order still matches its key. */
function canonical(value: FormValue): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  return `{${Object.keys(value)
    .sort()
    .map((key) => `${JSON.stringify(key)}:${canonical(value[key]!)}`)
    .join(',')}}`;
}

function headerValue(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

async function readBody(req: IncomingMessage): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > 1_000_000) throw new Error('request body over 1 MB');
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks).toString('utf8');
}

function send(res: ServerResponse, status: number, body: unknown): void {
  sendRaw(res, status, JSON.stringify(body));
}

function sendRaw(res: ServerResponse, status: number, text: string): void {
  res.writeHead(status, { 'content-type': 'application/json', 'content-length': Buffer.byteLength(text), 'stripe-version': Stripe.API_VERSION });
  res.end(text);
}
