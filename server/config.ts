import { z } from 'zod';

const bool = z
  .enum(['true', 'false', '1', '0'], { error: 'must be true or false' })
  .transform((v) => v === 'true' || v === '1');
const port = z.coerce.number().int().min(0).max(65535);

/** Every setting the server reads, from environment variables, with local defaults. */
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: port.default(8080),
  APP_ORIGIN: z.url().default('http://127.0.0.1:8080'),
  TRUST_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
  SHUTDOWN_DRAIN_MS: z.coerce.number().int().min(0).max(60_000).default(3_000),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  CLIENT_DIST: z.string().default('dist/client'),

  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: port.default(3307),
  DB_NAME: z.string().default('benchwright'),
  DB_USER: z.string().default('benchwright'),
  DB_PASSWORD: z.string().default(''),

  SESSION_SECRET: z.string().optional(),
  SESSION_IDLE_MINUTES: z.coerce
    .number()
    .int()
    .min(1)
    .max(24 * 60)
    .default(30),
  SESSION_ABSOLUTE_HOURS: z.coerce
    .number()
    .int()
    .min(1)
    .max(24 * 30)
    .default(12),
  COOKIE_SECURE: bool.default(false),

  SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(5),
  SIGN_IN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(30),
  SIGN_IN_LIMIT_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  PLANNER_LIMIT_PER_MINUTE: z.coerce.number().int().min(1).default(120),

  S3_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().default('eu-west-2'),
  S3_BUCKET: z.string().min(3).default('benchwright-photos'),
  S3_ACCESS_KEY_ID: z.string().default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().default('S3RVER'),
  S3_FORCE_PATH_STYLE: bool.default(true),

  STRIPE_SECRET_KEY: z.string().default('sk_test_benchwright_local'),
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_API_PORT: port.optional(),
  STRIPE_API_PROTOCOL: z.enum(['http', 'https']).optional(),
  STRIPE_WEBHOOK_SECRET: z.string().optional(),

  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: port.default(1025),
  SMTP_SECURE: bool.default(false),
  SMTP_IGNORE_TLS: bool.default(true),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default('Benchwright <no-reply@benchwright.test>'),
  MAIL_INBOX_URL: z.url().optional(),
});

export type Env = z.infer<typeof envSchema>;

/** Typed configuration, parsed once at boot. */
export interface Config {
  env: Env['NODE_ENV'];
  host: string;
  port: number;
  appOrigin: string;
  trustProxyHops: number;
  /** After SIGTERM: how long health answers 503 while requests are still served, before the listener closes. */
  shutdownDrainMs: number;
  logLevel: Env['LOG_LEVEL'];
  clientDist: string;
  db: { host: string; port: number; database: string; user: string; password: string };
  session: { secret: string; idleMinutes: number; absoluteHours: number; cookieSecure: boolean };
  signInLimits: { perAccount: number; perAddress: number; windowMinutes: number };
  /** Plans computed per address per minute by the public planner. */
  plannerLimitPerMinute: number;
  /** Prefix for rate-limit keys, so independent app instances (tests) do not share counters. */
  rateLimitNamespace: string;
  s3: {
    endpoint?: string;
    region: string;
    bucket: string;
    accessKeyId: string;
    secretAccessKey: string;
    forcePathStyle: boolean;
  };
  stripe: {
    secretKey: string;
    host?: string;
    port?: number;
    protocol?: 'http' | 'https';
    webhookSecret: string;
  };
  mail: {
    host: string;
    port: number;
    secure: boolean;
    ignoreTLS: boolean;
    user?: string;
    password?: string;
    from: string;
    inboxUrl?: string;
  };
}

const LOCAL_ONLY_SECRET = 'local-development-only-secret-not-for-production';

/** Parse the environment into a Config, or throw naming every bad variable. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const production = e.NODE_ENV === 'production';
  if (production && (!e.SESSION_SECRET || !e.STRIPE_WEBHOOK_SECRET || !e.DB_PASSWORD)) {
    throw new Error(
      'Invalid configuration: SESSION_SECRET, STRIPE_WEBHOOK_SECRET and DB_PASSWORD are required in production',
    );
  }
  return {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    appOrigin: e.APP_ORIGIN.replace(/\/$/, ''),
    trustProxyHops: e.TRUST_PROXY_HOPS,
    shutdownDrainMs: e.SHUTDOWN_DRAIN_MS,
    logLevel: e.LOG_LEVEL,
    clientDist: e.CLIENT_DIST,
    db: { host: e.DB_HOST, port: e.DB_PORT, database: e.DB_NAME, user: e.DB_USER, password: e.DB_PASSWORD },
    session: {
      secret: e.SESSION_SECRET ?? LOCAL_ONLY_SECRET,
      idleMinutes: e.SESSION_IDLE_MINUTES,
      absoluteHours: e.SESSION_ABSOLUTE_HOURS,
      cookieSecure: e.COOKIE_SECURE,
    },
    signInLimits: {
      perAccount: e.SIGN_IN_LIMIT_PER_ACCOUNT,
      perAddress: e.SIGN_IN_LIMIT_PER_ADDRESS,
      windowMinutes: e.SIGN_IN_LIMIT_WINDOW_MINUTES,
    },
    plannerLimitPerMinute: e.PLANNER_LIMIT_PER_MINUTE,
    rateLimitNamespace: 'bw',
    s3: {
      endpoint: e.S3_ENDPOINT,
      region: e.S3_REGION,
      bucket: e.S3_BUCKET,
      accessKeyId: e.S3_ACCESS_KEY_ID,
      secretAccessKey: e.S3_SECRET_ACCESS_KEY,
      forcePathStyle: e.S3_FORCE_PATH_STYLE,
    },
    stripe: {
      secretKey: e.STRIPE_SECRET_KEY,
      host: e.STRIPE_API_HOST,
      port: e.STRIPE_API_PORT,
      protocol: e.STRIPE_API_PROTOCOL,
      webhookSecret: e.STRIPE_WEBHOOK_SECRET ?? 'whsec_local_development_only',
    },
    mail: {
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_SECURE,
      ignoreTLS: e.SMTP_IGNORE_TLS,
      user: e.SMTP_USER,
      password: e.SMTP_PASSWORD,
      from: e.MAIL_FROM,
      inboxUrl: e.MAIL_INBOX_URL,
    },
  };
}
