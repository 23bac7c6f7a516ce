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
  /** What an empty database gets at start: the whole demo business, the same without its payroll, its organisation, branches and sign-ins only, or nothing. */
  seedDemo: 'full' | 'tickets' | 'basic' | false;
  webDist: string | null;
  checkpointMinutes: number;
  /** Staff a payroll run reads, computes and stores at a time: more is a little faster and holds more in memory. */
  payrollGroupSize: number;
  /** Card payments: the stripe SDK against the local fake unless a real secret key is set. */
  cardProcessor: { mode: 'fake' | 'live'; secretKey: string; webhookSecret: string; fakePort: number };
  /** Outgoing mail: the local SMTP fake started with the app, or a real SMTP server when SMTP_HOST is set. */
  mail: MailSettings;
};

export type SmtpServerSettings = { host: string; port: number; secure: boolean; user: string | null; password: string | null };
export type MailSettings = { from: string } & ({ mode: 'fake'; fakePort: number } | { mode: 'smtp'; server: SmtpServerSettings });

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

// A bare address or `Name <address>`; the real server has the last word on what it accepts.
const MAIL_FROM = /^(?:[^<>@\r\n]*<[^<>@\s]+@[^<>@\s]+\.[^<>@\s]+>|[^<>@\s]+@[^<>@\s]+\.[^<>@\s]+)$/;
const SMTP_DETAILS = ['SMTP_PORT', 'SMTP_USER', 'SMTP_PASSWORD', 'SMTP_SECURE'] as const;

function mailSettings(env: NodeJS.ProcessEnv): MailSettings {
  const from = env.MAIL_FROM?.trim() || null;
  if (from && !MAIL_FROM.test(from)) throw new ConfigError(`MAIL_FROM must be an address such as "Payroll <payroll@example.com>", got "${from}"`);
  const host = env.SMTP_HOST?.trim() || null;
  if (!host) {
    const stray = SMTP_DETAILS.find((name) => env[name]?.trim());
    if (stray) throw new ConfigError(`${stray} is set but SMTP_HOST is not: set SMTP_HOST to send through a real mail server`);
    return { mode: 'fake', from: from ?? 'Tressury <no-reply@tressury.example>', fakePort: integer(env, 'SMTP_FAKE_PORT', 0, 0, 65535) };
  }
  if (/[\s/:]/.test(host)) throw new ConfigError(`SMTP_HOST must be a host name or IP address without scheme or port, got "${host}"`);
  if (!from) throw new ConfigError('MAIL_FROM is required with SMTP_HOST: the sender address the mail server accepts from Tressury');
  const secure = flag(env, 'SMTP_SECURE', env.SMTP_PORT?.trim() === '465');
  const user = env.SMTP_USER?.trim() || null;
  const password = env.SMTP_PASSWORD || null;
  if (user && !password) throw new ConfigError('SMTP_PASSWORD is required with SMTP_USER');
  if (password && !user) throw new ConfigError('SMTP_USER is required with SMTP_PASSWORD');
  return { mode: 'smtp', from, server: { host, port: integer(env, 'SMTP_PORT', secure ? 465 : 587, 1, 65535), secure, user, password } };
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
    seedDemo:
      env.TRESSURY_SEED_DEMO === 'basic' || env.TRESSURY_SEED_DEMO === 'tickets'
        ? env.TRESSURY_SEED_DEMO
        : env.TRESSURY_SEED_DEMO === 'full' || flag(env, 'TRESSURY_SEED_DEMO', true)
          ? 'full'
          : false,
    webDist: env.TRESSURY_WEB_DIST === '' ? null : (env.TRESSURY_WEB_DIST ?? null),
    checkpointMinutes: integer(env, 'CHECKPOINT_MINUTES', 5, 1, 1440),
    payrollGroupSize: integer(env, 'PAYROLL_GROUP_SIZE', 200, 1, 5000),
    cardProcessor: stripeKey
      ? { mode: 'live', secretKey: stripeKey, webhookSecret: stripeWebhookSecret!, fakePort: 0 }
      : {
          mode: 'fake',
          secretKey: `sk_test_fake_${randomBytes(12).toString('hex')}`,
          webhookSecret: `whsec_fake_${randomBytes(24).toString('hex')}`,
          fakePort: integer(env, 'CARD_PROCESSOR_FAKE_PORT', 0, 0, 65535),
        },
    mail: mailSettings(env),
  };
}

