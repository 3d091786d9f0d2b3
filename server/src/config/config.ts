import path from 'node:path';
import { storedSecret } from './secret-store';

/** Everything the server reads from its environment, with working local defaults. */
export interface Config {
  env: 'development' | 'test' | 'production';
  host: string;
  port: number;
  /** The address users reach the apps at; links in e-mails start with it. */
  publicUrl: string;
  dataDir: string;
  databaseUrl: string;
  /** Where the built apps are (dist/designer/browser and dist/admin/browser below it). */
  appDistDir: string;
  trustProxy: boolean | number | string;
  logLevel: string;
  mail: { host: string; port: number; from: string; inboxUrl: string | null };
  payment: { apiUrl: string; secretKey: string; webhookSecret: string };
  billing: { graceDays: number; evaluationSeats: number; trialDays: number; pricePerSeatMonthly: number; currency: string };
  auth: {
    jwtSecret: string;
    issuer: string;
    audience: string;
    accessTokenSeconds: number;
    refreshTokenDays: number;
    passwordResetMinutes: number;
    invitationDays: number;
    bcryptCost: number;
    cookieSecure: boolean;
  };
  limits: {
    jsonBody: string;
    /** Body limit of part documents (inline meshes). */
    partBody: string;
    meshUploadBytes: number;
    meshTriangles: number;
    signinPerWindow: number;
    signupPerWindow: number;
    passwordResetPerWindow: number;
    windowSeconds: number;
  };
}

type Env = Record<string, string | undefined>;

function int(env: Env, name: string, fallback: number, min = 0): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min) throw new Error(`${name} must be an integer ≥ ${min} (got "${raw}")`);
  return value;
}

function bool(env: Env, name: string, fallback: boolean): boolean {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  return raw === 'true' || raw === '1';
}

/** Reads the configuration; secrets not given are generated once into the data folder. */
export function loadConfig(env: Env = process.env): Config {
  const nodeEnv = (env.NODE_ENV === 'production' || env.NODE_ENV === 'test' ? env.NODE_ENV : 'development') as Config['env'];
  const root = path.resolve(__dirname, '../../..');
  const dataDir = path.resolve(env.DATA_DIR ?? path.join(root, '.data'));
  const host = env.HOST ?? '127.0.0.1';
  const port = int(env, 'PORT', 4300);
  const jwtSecret = env.JWT_SECRET ?? storedSecret(dataDir, 'jwtSecret');
  if (Buffer.byteLength(jwtSecret) < 32) throw new Error('JWT_SECRET must be at least 32 bytes');
  const bcryptCost = int(env, 'BCRYPT_COST', nodeEnv === 'test' ? 4 : 12, 4);
  if (nodeEnv !== 'test' && bcryptCost < 10) throw new Error('BCRYPT_COST must be at least 10 outside tests');
  const trustProxyRaw = env.TRUST_PROXY;
  return {
    env: nodeEnv,
    host,
    port,
    publicUrl: (env.PUBLIC_URL ?? `http://${host}:${port}`).replace(/\/+$/, ''),
    dataDir,
    databaseUrl: env.DATABASE_URL ?? `postgres://tumblewise@127.0.0.1:${int(env, 'TUMBLEWISE_PG_PORT', 54329)}/tumblewise`,
    appDistDir: path.resolve(env.APP_DIST_DIR ?? path.join(root, 'dist')),
    trustProxy:
      trustProxyRaw === undefined
        ? false
        : /^\d+$/.test(trustProxyRaw)
          ? Number(trustProxyRaw)
          : trustProxyRaw === 'true'
            ? true
            : trustProxyRaw,
    logLevel: env.LOG_LEVEL ?? (nodeEnv === 'test' ? 'silent' : 'info'),
    mail: {
      host: env.SMTP_HOST ?? '127.0.0.1',
      port: int(env, 'SMTP_PORT', 4325),
      from: env.MAIL_FROM ?? 'Tumblewise <no-reply@tumblewise.test>',
      inboxUrl: env.MAIL_INBOX_URL ?? null,
    },
    payment: {
      apiUrl: env.PAYMENT_API_URL ?? 'http://127.0.0.1:4390',
      secretKey: env.PAYMENT_SECRET_KEY ?? storedSecret(dataDir, 'paymentSecretKey', () => `sk_test_${Date.now().toString(36)}local`),
      webhookSecret:
        env.PAYMENT_WEBHOOK_SECRET ??
        storedSecret(dataDir, 'paymentWebhookSecret', () => `whsec_${Math.random().toString(36).slice(2)}${Date.now().toString(36)}`),
    },
    billing: {
      graceDays: int(env, 'BILLING_GRACE_DAYS', 7, 0),
      evaluationSeats: int(env, 'EVALUATION_SEATS', 5, 1),
      trialDays: int(env, 'TRIAL_DAYS', 14, 0),
      pricePerSeatMonthly: int(env, 'SEAT_PRICE_CENTS', 2400, 0),
      currency: env.BILLING_CURRENCY ?? 'eur',
    },
    auth: {
      jwtSecret,
      issuer: env.JWT_ISSUER ?? 'tumblewise',
      audience: env.JWT_AUDIENCE ?? 'tumblewise-api',
      accessTokenSeconds: int(env, 'ACCESS_TOKEN_SECONDS', 900, 10),
      refreshTokenDays: int(env, 'REFRESH_TOKEN_DAYS', 30, 1),
      passwordResetMinutes: int(env, 'PASSWORD_RESET_MINUTES', 60, 1),
      invitationDays: int(env, 'INVITATION_DAYS', 7, 1),
      bcryptCost,
      cookieSecure: bool(env, 'COOKIE_SECURE', nodeEnv === 'production'),
    },
    limits: {
      jsonBody: env.JSON_BODY_LIMIT ?? '1mb',
      partBody: env.PART_BODY_LIMIT ?? '32mb',
      meshUploadBytes: int(env, 'MESH_UPLOAD_LIMIT_BYTES', 64 * 1024 * 1024, 1024),
      meshTriangles: int(env, 'MESH_MAX_TRIANGLES', 2_000_000, 1),
      signinPerWindow: int(env, 'RATE_LIMIT_SIGNIN', 10, 1),
      signupPerWindow: int(env, 'RATE_LIMIT_SIGNUP', 10, 1),
      passwordResetPerWindow: int(env, 'RATE_LIMIT_PASSWORD_RESET', 5, 1),
      windowSeconds: int(env, 'RATE_LIMIT_WINDOW_SECONDS', 900, 1),
    },
  };
}
