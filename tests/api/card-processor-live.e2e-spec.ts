import { CardProcessor, WEBHOOK_PATH } from '../../apps/api/src/card-processor/card-processor.js';
import Stripe from 'stripe';
import { startTestApp, type TestApp } from './support/test-app.js';

// With STRIPE_SECRET_KEY set the API talks to the real service: nothing here may charge, it only checks the switch.
describe('card processor with a real secret key in the environment', () => {
  const webhookSecret = 'whsec_configured_for_this_test';
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp({ STRIPE_SECRET_KEY: 'sk_test_configured_for_this_test', STRIPE_WEBHOOK_SECRET: webhookSecret });
  });
  afterAll(async () => {
    await t.close();
    // startTestApp writes its settings into process.env; later apps in this worker must be back in fake mode.
    Object.assign(process.env, { STRIPE_SECRET_KEY: '', STRIPE_WEBHOOK_SECRET: '' });
  });

  it('starts no fake', () => {
    expect(t.app.get(CardProcessor).fake).toBeNull();
  });

  it('verifies webhook events with STRIPE_WEBHOOK_SECRET', async () => {
    const payload = JSON.stringify({ id: 'evt_live_switch', object: 'event', type: 'customer.created', created: 1, livemode: true, data: { object: {} } });
    const post = (secret: string) =>
      t
        .http()
        .post(WEBHOOK_PATH)
        .set('content-type', 'application/json')
        .set('stripe-signature', Stripe.webhooks.generateTestHeaderString({ payload, secret }))
        .send(payload);
    expect((await post('whsec_some_other_secret')).status).toBe(400);
    expect((await post(webhookSecret)).status).toBe(200);
  });
});
