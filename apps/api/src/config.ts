import { randomBytes } from 'node:crypto';
import { resolve } from 'node:path';

export type AppConfig = {
  host: string;
  port: number;
  databaseUrl: string | null;
  /** PGlite data directory, or `memory://` for a throwaway database. */
  dataDir: string;
  jwtSecret: string;
  accessTokenSeconds: number;
  refreshTokenDays: number;
  cookieSecure: boolean;
  loginThrottleLimit: number;
  loginThrottleWindowMs: number;
  /** What an empty database gets at start: the whole demo business, its organisation, branches and sign-ins only, or nothing. */
  seedDemo: 'full' | 'basic' | false;
  webDist: string | null;
  checkpointMinutes: number;
  /** Card payments: the stripe SDK against the local fake unless a real secret key is set. */
  cardProcessor: { mode: 'fake' | 'live'; secretKey: string; webhookSecret: string; fakePort: number };
};

export class ConfigError extends Error {}

function integer(env: NodeJS.ProcessEnv, name: string, fallback: number, min: number, max: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  if (!/^\d+$/.test(raw)) throw new ConfigError(`${name} must be a whole number, got "${raw}"`);
  const value = Number(raw);
  if (value < min || value > max) throw new ConfigError(`${name} must be between ${min} and ${max}, got ${value}`);
  return value;
}

function flag(env: NodeJS.ProcessEnv, name: string, fallback: boolean): boolean {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  if (raw === 'true' || raw === '1') return true;
  if (raw === 'false' || raw === '0') return false;
  throw new ConfigError(`${name} must be true or false, got "${raw}"`);
}

/** Reads and checks the environment once at boot; a bad value stops the app with the variable named. */
export function parseConfig(env: NodeJS.ProcessEnv): AppConfig {
  const databaseUrl = env.DATABASE_URL?.trim() || null;
  if (databaseUrl && !/^postgres(ql)?:\/\//.test(databaseUrl)) {
    throw new ConfigError('DATABASE_URL must start with postgres:// or postgresql://');
  }
  const jwtSecret = env.JWT_SECRET?.trim() || null;
  if (jwtSecret && jwtSecret.length < 32) throw new ConfigError('JWT_SECRET must be at least 32 characters');
  if (databaseUrl && !jwtSecret && env.NODE_ENV === 'production') {
    throw new ConfigError('JWT_SECRET is required with DATABASE_URL in production, so every API instance signs alike');
  }
  const dataDir = env.TRESSURY_DATA_DIR?.trim() || './data';
  const stripeKey = env.STRIPE_SECRET_KEY?.trim() || null;
  const stripeWebhookSecret = env.STRIPE_WEBHOOK_SECRET?.trim() || null;
  if (stripeKey && !/^(sk|rk)_/.test(stripeKey)) throw new ConfigError('STRIPE_SECRET_KEY must be a secret key (sk_… or rk_…)');
  if (stripeKey && !stripeWebhookSecret) throw new ConfigError('STRIPE_WEBHOOK_SECRET is required with STRIPE_SECRET_KEY');
  return {
    host: env.HOST?.trim() || '127.0.0.1',
    port: integer(env, 'PORT', 3000, 0, 65535),
    databaseUrl,
    dataDir: dataDir.startsWith('memory://') ? dataDir : resolve(dataDir),
    // Without a configured secret each start signs with a new one; the refresh cookie then renews the session.
    jwtSecret: jwtSecret ?? randomBytes(48).toString('base64url'),
    accessTokenSeconds: integer(env, 'ACCESS_TOKEN_SECONDS', 600, 60, 3600),
    refreshTokenDays: integer(env, 'REFRESH_TOKEN_DAYS', 14, 1, 90),
    cookieSecure: flag(env, 'COOKIE_SECURE', false),
    loginThrottleLimit: integer(env, 'LOGIN_THROTTLE_LIMIT', 10, 1, 100000),
    loginThrottleWindowMs: integer(env, 'LOGIN_THROTTLE_WINDOW_MS', 60000, 1000, 3600000),
    seedDemo: env.TRESSURY_SEED_DEMO === 'basic' ? 'basic' : env.TRESSURY_SEED_DEMO === 'full' || flag(env, 'TRESSURY_SEED_DEMO', true) ? 'full' : false,
    webDist: env.TRESSURY_WEB_DIST === '' ? null : (env.TRESSURY_WEB_DIST ?? null),
    checkpointMinutes: integer(env, 'CHECKPOINT_MINUTES', 5, 1, 1440),
    cardProcessor: stripeKey
      ? { mode: 'live', secretKey: stripeKey, webhookSecret: stripeWebhookSecret!, fakePort: 0 }
      : {
          mode: 'fake',
          secretKey: `sk_test_fake_${randomBytes(12).toString('hex')}`,
          webhookSecret: `whsec_fake_${randomBytes(24).toString('hex')}`,
          fakePort: integer(env, 'CARD_PROCESSOR_FAKE_PORT', 0, 0, 65535),
        },
  };
}

