import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

/** Everything the server reads from its environment, checked once at start. */
export interface AppConfig {
  port: number;
  host: string;
  dataDir: string;
  /** When set, a real PostgreSQL server is used instead of the embedded PGlite. */
  databaseUrl: string | null;
  /** Tests only: keep the embedded database in memory. */
  inMemoryDatabase: boolean;
  jwtSecret: string;
  accessTokenTtlSeconds: number;
  demo: boolean;
  /** Seed the demo doc set too (tests turn it off to stay fast). */
  demoContent: boolean;
  adminEmail: string | null;
  adminPassword: string | null;
  smtpUrl: string | null;
  mailFrom: string;
  publicUrl: string;
  nightlyTime: string;
  sourceRoot: string | null;
  uploadMaxBytes: number;
  signInLimitPerMinute: number;
  importsPerHour: number;
  /** Longest a whole import may take, and one page's parse (docs/threats.md "Limits" starting values, raised for big doc sets). */
  importTimeoutSeconds: number;
  pageParseTimeoutMs: number;
  logFormat: 'json' | 'text';
  logRequests: boolean;
  frontendDist: string | null;
  /** Seconds between outbox delivery attempts (base of the backoff). */
  mailRetryBaseSeconds: number;
  /** Port of the built-in local mailbox on 127.0.0.1 (0 = any free port). */
  mailboxPort: number;
  /** How often the outbox sender looks for due messages. */
  mailPollMs: number;
  backupsKept: number;
  /** Check every answer against its route's response schema (docs/api.md); on unless NODE_ENV is production. */
  checkResponses: boolean;
}

const PLACEHOLDER_SECRETS = new Set(['changeme', 'secret', 'change-me-to-a-long-random-string']);

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Configuration is not valid:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
  }
}

function int(env: NodeJS.ProcessEnv, name: string, fallback: number, problems: string[], min = 0, max = Number.MAX_SAFE_INTEGER): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min || value > max) {
    problems.push(`${name} must be a whole number between ${min} and ${max} (got "${raw}")`);
    return fallback;
  }
  return value;
}

function bool(env: NodeJS.ProcessEnv, name: string, fallback: boolean, problems: string[]): boolean {
  const raw = env[name]?.trim().toLowerCase();
  if (raw === undefined || raw === '') return fallback;
  if (['1', 'true', 'yes', 'on'].includes(raw)) return true;
  if (['0', 'false', 'no', 'off'].includes(raw)) return false;
  problems.push(`${name} must be true or false (got "${env[name]}")`);
  return fallback;
}

/** The signing secret: from JWT_SECRET, else generated once and kept in the data folder. */
function signingSecret(env: NodeJS.ProcessEnv, dataDir: string, persist: boolean, problems: string[]): string {
  const given = env.JWT_SECRET;
  if (given !== undefined && given !== '') {
    if (Buffer.byteLength(given) < 32) problems.push('JWT_SECRET must be at least 32 bytes long (use 64 random characters)');
    if (PLACEHOLDER_SECRETS.has(given.toLowerCase())) problems.push('JWT_SECRET is a sample placeholder; set a random value');
    return given;
  }
  if (!persist) return randomBytes(48).toString('base64url');
  const file = join(dataDir, 'jwt-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env, overrides: Partial<AppConfig> = {}): AppConfig {
  const problems: string[] = [];
  const dataDir = resolve(overrides.dataDir ?? env.DATA_DIR ?? './data');
  const inMemoryDatabase = overrides.inMemoryDatabase ?? false;
  const nightlyTime = env.NIGHTLY_TIME ?? '02:00';
  if (!/^([01]\d|2[0-3]):[0-5]\d$/.test(nightlyTime)) problems.push(`NIGHTLY_TIME must look like 02:00 (got "${nightlyTime}")`);
  const logFormat = (env.LOG_FORMAT ?? 'json') as AppConfig['logFormat'];
  if (!['json', 'text'].includes(logFormat)) problems.push('LOG_FORMAT must be json or text');
  const port = int(env, 'PORT', 3000, problems, 0, 65535);
  const config: AppConfig = {
    port,
    host: env.HOST ?? '0.0.0.0',
    dataDir,
    databaseUrl: env.DATABASE_URL || null,
    inMemoryDatabase,
    jwtSecret: overrides.jwtSecret ?? signingSecret(env, dataDir, !inMemoryDatabase, problems),
    accessTokenTtlSeconds: int(env, 'ACCESS_TOKEN_TTL_SECONDS', 8 * 3600, problems, 60, 30 * 24 * 3600),
    demo: bool(env, 'DEMO', true, problems),
    demoContent: bool(env, 'DEMO_CONTENT', true, problems),
    adminEmail: env.ADMIN_EMAIL || null,
    adminPassword: env.ADMIN_PASSWORD || null,
    smtpUrl: env.SMTP_URL || null,
    mailFrom: env.MAIL_FROM ?? 'Linkloom <linkloom@localhost>',
    publicUrl: (env.PUBLIC_URL ?? `http://localhost:${port}`).replace(/\/+$/, ''),
    nightlyTime,
    sourceRoot: env.SOURCE_ROOT ? resolve(env.SOURCE_ROOT) : null,
    uploadMaxBytes: int(env, 'UPLOAD_MAX_BYTES', 50 * 1024 * 1024, problems, 1024),
    signInLimitPerMinute: int(env, 'SIGN_IN_LIMIT_PER_MINUTE', 5, problems, 1),
    importsPerHour: int(env, 'IMPORTS_PER_HOUR', 20, problems, 1),
    importTimeoutSeconds: int(env, 'IMPORT_TIMEOUT_SECONDS', 900, problems, 10, 86_400),
    pageParseTimeoutMs: int(env, 'PAGE_PARSE_TIMEOUT_MS', 2_000, problems, 100, 600_000),
    logFormat,
    logRequests: bool(env, 'LOG_REQUESTS', true, problems),
    frontendDist: null,
    mailRetryBaseSeconds: int(env, 'MAIL_RETRY_BASE_SECONDS', 30, problems, 1),
    mailboxPort: int(env, 'MAILBOX_PORT', 0, problems, 0, 65535),
    mailPollMs: int(env, 'MAIL_POLL_MS', 5000, problems, 50),
    backupsKept: int(env, 'BACKUPS_KEPT', 7, problems, 1, 365),
    checkResponses: bool(env, 'CHECK_RESPONSES', env.NODE_ENV !== 'production', problems),
    ...overrides,
  };
  if (problems.length) throw new ConfigError(problems);
  return config;
}

export const APP_CONFIG = Symbol('APP_CONFIG');
