import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { HttpAdapterHost } from '@nestjs/core';
import { DomainError } from '@tressury/domain';
import { type CardProcessorFake, startCardProcessorFake } from '@tressury/fakes';
import Big from 'big.js';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import type { AppConfig } from '../config.js';
import {
  amountTooSmall,
  attemptReused,
  badSignature,
  CardProcessorUnavailableError,
  cardPaymentNotFound,
  nothingToRefund,
  refundTooLarge,
  unknownPaymentMethod,
} from './card-processor-errors.js';
import { declineMessage } from './decline-message.js';
import { fromMinorUnits, toMinorUnits } from './minor-units.js';

/** The global prefix (configure-app.ts) plus this feature's webhook route: the URL path to register with the processor. */
export const WEBHOOK_PATH = '/api/card-processor/webhook';

export type CardChargeRequest = {
  /** Decimal string in `currency`, e.g. "42.50". */
  amount: string;
  /** ISO 4217, e.g. the branch's "USD". */
  currency: string;
  /** A payment method id from the card reader or the web form; `pm_card_visa` etc. with the fake. */
  paymentMethod: string;
  /** Derive it from the business operation (ticket and checkout attempt): a repeat gives the first outcome. */
  idempotencyKey: string;
  /** Kept with the payment and used to filter `cardTotalBetween`, e.g. { branchId, ticketId }. */
  metadata?: Record<string, string>;
  description?: string;
};

export type CardChargeResult = {
  processorPaymentId: string;
  status: 'succeeded' | 'failed' | 'pending';
  /** Why the card was declined, in words for the front desk. */
  message?: string;
};

export type CardRefundRequest = { processorPaymentId: string; amount: string; idempotencyKey: string; metadata?: Record<string, string> };
export type CardRefundResult = { processorRefundId: string; status: 'succeeded' | 'pending' | 'failed' };
export type CardRefundRecord = CardRefundResult & { amount: string; currency: string };

const IDEMPOTENCY_KEY_MAX = 255;

/**
 * Card payments through the stripe SDK. With STRIPE_SECRET_KEY set it talks to the real service; otherwise it
 * starts the local fake (tools/fakes) and points the same SDK at it, so both modes run the same code.
 */
@Injectable()
export class CardProcessor implements OnModuleInit, OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('CardProcessor');
  private readonly settings: AppConfig['cardProcessor'];
  private client: Stripe | null = null;
  private runningFake: CardProcessorFake | null = null;

  constructor(
    config: ConfigService<AppConfig, true>,
    private readonly adapterHost: HttpAdapterHost,
  ) {
    this.settings = config.get('cardProcessor', { infer: true });
  }

  /** The local fake in fake mode, null against the real service; tests read its charges and resend its events. */
  get fake(): CardProcessorFake | null {
    return this.runningFake;
  }

  async onModuleInit(): Promise<void> {
    const { mode, secretKey, webhookSecret, fakePort } = this.settings;
    if (mode === 'live') {
      this.client = new Stripe(secretKey, { maxNetworkRetries: 2, appInfo: { name: 'Tressury' } });
      return;
    }
    this.runningFake = await startCardProcessorFake({ port: fakePort, secretKey, webhookSecret });
    const { host, port } = this.runningFake;
    this.client = new Stripe(secretKey, { host, port, protocol: 'http', maxNetworkRetries: 2, telemetry: false });
    this.logger.log(`Card payments go to the local fake card processor on http://${host}:${port}`);
  }

  /** Once the API listens (app.listen), the fake sends its signed events to this app's webhook route. */
  onApplicationBootstrap(): void {
    const fake = this.runningFake;
    if (!fake) return;
    const point = () => {
      const address = (this.adapterHost.httpAdapter.getHttpServer() as Server).address();
      if (address && typeof address === 'object') fake.setWebhookUrl(`http://${loopbackFor(address)}:${address.port}${WEBHOOK_PATH}`);
    };
    if (this.adapterHost.listening) point();
    else this.adapterHost.listen$.subscribe(point);
  }

  async onModuleDestroy(): Promise<void> {
    await this.runningFake?.stop();
  }

  /** Charges a card at once. A declined card is a result (`failed` with a message), not an exception. */
  async charge(input: CardChargeRequest): Promise<CardChargeResult> {
    const amount = toMinorUnits(input.amount, input.currency);
    checkIdempotencyKey(input.idempotencyKey);
    try {
      const intent = await this.stripe.paymentIntents.create(
        {
          amount,
          currency: input.currency.toLowerCase(),
          payment_method: input.paymentMethod,
          allowed_payment_method_types: ['card'],
          confirm: true,
          metadata: input.metadata ?? {},
          ...(input.description ? { description: input.description } : {}),
        },
        { idempotencyKey: input.idempotencyKey },
      );
      return chargeResult(intent);
    } catch (error) {
      if (error instanceof Stripe.errors.StripeCardError && isPaymentIntent(error.payment_intent)) {
        return { processorPaymentId: error.payment_intent.id, status: 'failed', message: declineMessage(error.decline_code || error.code) };
      }
      throw translate(error, 'charge the card');
    }
  }

  /** Gives back `amount` (a decimal string in the payment's currency) of a card payment to the card. */
  async refund(input: CardRefundRequest): Promise<CardRefundResult> {
    checkIdempotencyKey(input.idempotencyKey);
    let intent: Stripe.PaymentIntent;
    try {
      intent = await this.stripe.paymentIntents.retrieve(input.processorPaymentId);
    } catch (error) {
      throw translate(error, 'find the card payment');
    }
    const amount = toMinorUnits(input.amount, intent.currency);
    try {
      const refund = await this.stripe.refunds.create(
        { payment_intent: intent.id, amount, ...(input.metadata ? { metadata: input.metadata } : {}) },
        { idempotencyKey: input.idempotencyKey },
      );
      return { processorRefundId: refund.id, status: refundStatus(refund.status) };
    } catch (error) {
      throw translate(error, 'refund the card payment');
    }
  }

  /**
   * Card money taken in [from, to) by the processor's clock: charges that succeeded minus refunds made in the
   * same window (a refund counts on the day it is made, like the ticket's refund lines), in one currency and,
   * when given, only payments whose metadata has every listed value (e.g. { branchId }).
   */
  async cardTotalBetween(window: { from: Date; to: Date; currency: string; metadata?: Record<string, string> }): Promise<string> {
    if (!(window.from < window.to)) throw new Error('cardTotalBetween needs from < to');
    const created = { gte: Math.ceil(window.from.getTime() / 1000), lt: Math.ceil(window.to.getTime() / 1000) };
    const currency = window.currency.toLowerCase();
    const wanted = Object.entries(window.metadata ?? {});
    const belongs = (intent: string | Stripe.PaymentIntent | null) =>
      wanted.length === 0 || (isPaymentIntent(intent) && wanted.every(([key, value]) => intent.metadata[key] === value));
    let total = new Big(0);
    try {
      for await (const charge of this.stripe.charges.list({ created, limit: 100, expand: ['data.payment_intent'] })) {
        if (charge.status === 'succeeded' && charge.currency === currency && belongs(charge.payment_intent)) total = total.plus(charge.amount_captured);
      }
      for await (const refund of this.stripe.refunds.list({ created, limit: 100, expand: ['data.payment_intent'] })) {
        const counts = refund.status === 'succeeded' || refund.status === 'pending';
        if (counts && refund.currency === currency && belongs(refund.payment_intent)) total = total.minus(refund.amount);
      }
    } catch (error) {
      throw translate(error, 'list the card payments');
    }
    return fromMinorUnits(total, currency);
  }

  /** Every refund made on one charge, as the processor reports them now. */
  async refundsOfCharge(chargeId: string): Promise<CardRefundRecord[]> {
    try {
      const refunds = await this.stripe.refunds.list({ charge: chargeId, limit: 100 }).autoPagingToArray({ limit: 10_000 });
      return refunds.map((refund) => ({
        processorRefundId: refund.id,
        status: refundStatus(refund.status),
        amount: fromMinorUnits(refund.amount, refund.currency),
        currency: refund.currency.toUpperCase(),
      }));
    } catch (error) {
      throw translate(error, 'list the refunds');
    }
  }

  /** Checks the `stripe-signature` header against the raw body with the SDK's own check; a forgery is a 400. */
  verifyEvent(payload: Buffer | undefined, signature: string | undefined): Stripe.Event {
    if (!payload || payload.length === 0 || !signature) throw badSignature();
    try {
      return this.stripe.webhooks.constructEvent(payload, signature, this.settings.webhookSecret);
    } catch (error) {
      if (error instanceof Stripe.errors.StripeSignatureVerificationError) throw badSignature();
      throw error;
    }
  }

  private get stripe(): Stripe {
    if (!this.client) throw new Error('CardProcessor was used before its module started');
    return this.client;
  }
}

function loopbackFor(address: AddressInfo): string {
  if (address.address === '0.0.0.0') return '127.0.0.1';
  if (address.address === '::') return '[::1]';
  return address.family === 'IPv6' ? `[${address.address}]` : address.address;
}

function checkIdempotencyKey(key: string): void {
  if (typeof key !== 'string' || key.length === 0 || key.length > IDEMPOTENCY_KEY_MAX) {
    throw new DomainError('card_processor.idempotency_key', `idempotencyKey must be 1 to ${IDEMPOTENCY_KEY_MAX} characters.`, 'invalid', 'idempotencyKey');
  }
}

function isPaymentIntent(value: unknown): value is Stripe.PaymentIntent {
  return typeof value === 'object' && value !== null && (value as { object?: unknown }).object === 'payment_intent';
}

function chargeResult(intent: Stripe.PaymentIntent): CardChargeResult {
  if (intent.status === 'succeeded') return { processorPaymentId: intent.id, status: 'succeeded' };
  if (intent.status === 'requires_payment_method' || intent.status === 'canceled') {
    const error = intent.last_payment_error;
    return { processorPaymentId: intent.id, status: 'failed', message: declineMessage(error?.decline_code || error?.code) };
  }
  return { processorPaymentId: intent.id, status: 'pending' };
}

function refundStatus(status: string | null): CardRefundResult['status'] {
  if (status === 'succeeded') return 'succeeded';
  if (status === 'failed' || status === 'canceled') return 'failed';
  return 'pending';
}

function translate(error: unknown, action: string): unknown {
  if (error instanceof Stripe.errors.StripeIdempotencyError) return attemptReused();
  if (error instanceof Stripe.errors.StripeInvalidRequestError) {
    if (error.code === 'resource_missing' && error.param === 'payment_method') return unknownPaymentMethod();
    if (error.code === 'resource_missing') return cardPaymentNotFound();
    if (error.code === 'amount_too_large') return refundTooLarge();
    if (error.code === 'amount_too_small') return amountTooSmall();
    if (error.code === 'charge_already_refunded' || error.code === 'charge_not_refundable') return nothingToRefund();
  }
  if (error instanceof Stripe.errors.StripeError) {
    return new CardProcessorUnavailableError(`The card processor could not ${action}: ${error.type} ${error.message}`, error);
  }
  return error;
}
