import { randomBytes } from 'node:crypto';
import { existsSync, linkSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join, resolve } from 'node:path';
import { DEFAULT_NETCDF_LIMITS, type NetcdfLimits } from '../series/netcdf/size-limits';

/** Settings the server runs with, read once from the environment at start. */
export interface AppConfig {
  port: number;
  /** Address to listen on (HOST): loopback by default, so a fresh server is reachable from this machine only. */
  host: string;
  /** Folder for the SQLite file, uploads and generated secrets. */
  dataDir: string;
  databaseFile: string;
  jwtSecret: string;
  /** Lifetime of an access token, in seconds. */
  jwtTtlSeconds: number;
  /** Built web client to serve, or null to serve the API alone. */
  webDist: string | null;
  /** Sign-in and sign-up attempts allowed per client address per minute. */
  authAttemptsPerMinute: number;
  /** Largest upload accepted, in bytes (streamed to disk, never held in memory). */
  uploadMaxBytes: number;
  /**
   * Seed the demo group, people, series and notebooks on start: SEED_DEMO "true"
   * (the default) on a loopback bind, "force" on any bind, "false" never.
   */
  seedDemo: boolean;
  /** The demo seed was asked for but refused because HOST is not a loopback address (the start-up log says so). */
  seedDemoRefused: boolean;
  /** The one foreign origin browsers may call the API and socket from (CORS); the app's own address by default. */
  appOrigin: string;
  /** Redis for socket fan-out across several server processes, or null for one process alone. */
  redisUrl: string | null;
  /** Outgoing SMTP server, or null to start the in-process local mailbox instead. */
  smtpUrl: string | null;
  /** Sender of every mail Upwell sends. */
  mailFrom: string;
  /** Where people reach the web app; links in mail start here (no trailing slash). */
  appUrl: string;
  /** How long an invitation link stays valid, in hours. */
  invitationTtlHours: number;
  /** Invitations one person may send per hour. */
  invitationsPerHour: number;
  /** Worker threads for previews, imports and reductions (JOB_WORKERS; default one per core). */
  jobWorkers: number;
  /** Cells one NetCDF variable may declare, and values one read may bring into memory. */
  netcdfLimits: NetcdfLimits;
  /** Upload quotas and timing (see README "Uploads"). */
  uploads: UploadLimits;
  /** Quiet spell after a person's last mention before their mention mail goes (one mail for all of them). */
  mentionMailQuietMs: number;
  /** Longest a mention waits for its mail while mentions keep coming. */
  mentionMailMaxWaitMs: number;
}

/** How much one person may upload, and how long staged files and silent uploads last. */
export interface UploadLimits {
  /** Uploads one person may send at the same time (UPLOAD_CONCURRENT_PER_PERSON). */
  concurrentPerPerson: number;
  /** Bytes one person's staged (not yet imported) uploads may take, in-flight ones included (UPLOAD_STAGED_BYTES_PER_PERSON). */
  stagedBytesPerPerson: number;
  /** A staged upload nothing was imported from is deleted after this many hours (UPLOAD_STAGED_TTL_HOURS). */
  stagedTtlHours: number;
  /** An upload that sends nothing for this long is cut (UPLOAD_IDLE_TIMEOUT_SECONDS); there is no total time limit. */
  idleTimeoutMs: number;
}

/** Name under which the config is registered with @nestjs/config. */
export const APP_CONFIG = 'app';

function positiveInt(name: string, raw: string | undefined, fallback: number): number {
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 0) throw new Error(`${name} must be a whole number, got "${raw}"`);
  return n;
}

/**
 * The JWT signing secret: JWT_SECRET if given, otherwise one generated on first
 * start and kept in DATA_DIR so tokens survive a restart. Never a constant in
 * the repository.
 */
function jwtSecret(dataDir: string, given: string | undefined): string {
  if (given) {
    if (given.length < 32) throw new Error('JWT_SECRET must be at least 32 characters');
    return given;
  }
  const dir = join(dataDir, 'secrets');
  const file = join(dir, 'jwt-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  // Written aside, then linked into place: link() fails if the file exists, so two
  // processes starting at once on one DATA_DIR agree on whichever secret landed first,
  // and neither can read a half-written file.
  const draft = `${file}.${process.pid}.${randomBytes(4).toString('hex')}`;
  writeFileSync(draft, randomBytes(48).toString('base64url') + '\n', { mode: 0o600, flag: 'wx' });
  try {
    linkSync(draft, file);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
  } finally {
    rmSync(draft, { force: true });
  }
  return readFileSync(file, 'utf8').trim();
}

/** REDIS_URL if given, checked to be a redis:// or rediss:// address. */
function redisUrl(raw: string | undefined): string | null {
  if (!raw) return null;
  let url: URL;
  try {
    url = new URL(raw);
  } catch {
    throw new Error(`REDIS_URL must be a URL such as redis://127.0.0.1:6379, got "${withoutPassword(raw)}"`);
  }
  if (url.protocol !== 'redis:' && url.protocol !== 'rediss:') throw new Error(`REDIS_URL must start with redis:// or rediss://, got "${withoutPassword(raw)}"`);
  return raw;
}

/** A Redis address fit for a log line: any password replaced by ***. */
export function withoutPassword(raw: string): string {
  try {
    const url = new URL(raw);
    if (url.password) url.password = '***';
    return url.toString();
  } catch {
    return raw.replace(/\/\/[^@/]*@/, '//***@');
  }
}

/** Whether an address to listen on is reachable from this machine only (127.0.0.0/8, ::1, localhost). */
export function isLoopbackHost(host: string): boolean {
  return host === 'localhost' || host === '::1' || /^127(\.\d{1,3}){3}$/.test(host);
}

/**
 * The demo's passwords are public (README, GET /api/demo), so the seed runs on a
 * loopback bind only unless SEED_DEMO=force says the person means it.
 */
function seedDemo(raw: string | undefined, host: string): { seedDemo: boolean; seedDemoRefused: boolean } {
  if (raw === 'false') return { seedDemo: false, seedDemoRefused: false };
  if (raw === 'force') return { seedDemo: true, seedDemoRefused: false };
  if (raw !== undefined && raw !== '' && raw !== 'true') throw new Error(`SEED_DEMO must be "true", "false" or "force", got "${raw}"`);
  const loopback = isLoopbackHost(host);
  return { seedDemo: loopback, seedDemoRefused: !loopback };
}

/** APP_ORIGIN as a browser sends it (scheme://host[:port], no path), or the fallback. */
function origin(raw: string | undefined, fallback: string): string {
  if (!raw) return fallback;
  let url: URL;
  try {
    url = new URL(raw);
  } catch {
    throw new Error(`APP_ORIGIN must be an origin such as https://upwell.example.org, got "${raw}"`);
  }
  return url.origin;
}

function mailConfig(env: NodeJS.ProcessEnv) {
  const smtpUrl = env.SMTP_URL || null;
  if (smtpUrl && !/^smtps?:\/\//.test(smtpUrl)) throw new Error(`SMTP_URL must start with smtp:// or smtps://, got "${smtpUrl}"`);
  const appUrl = (env.APP_URL || `http://localhost:${positiveInt('PORT', env.PORT, 3000)}`).replace(/\/+$/, '');
  if (!/^https?:\/\//.test(appUrl)) throw new Error(`APP_URL must start with http:// or https://, got "${appUrl}"`);
  const ttl = positiveInt('INVITATION_TTL_HOURS', env.INVITATION_TTL_HOURS, 7 * 24);
  if (ttl < 1) throw new Error('INVITATION_TTL_HOURS must be at least 1');
  return {
    smtpUrl,
    mailFrom: env.MAIL_FROM || 'Upwell <no-reply@upwell.localhost>',
    appUrl,
    invitationTtlHours: ttl,
    invitationsPerHour: positiveInt('INVITATIONS_PER_HOUR', env.INVITATIONS_PER_HOUR, 30),
    mentionMailQuietMs: positiveInt('MENTION_MAIL_QUIET_MS', env.MENTION_MAIL_QUIET_MS, 60_000),
    mentionMailMaxWaitMs: positiveInt('MENTION_MAIL_MAX_WAIT_MS', env.MENTION_MAIL_MAX_WAIT_MS, 15 * 60_000),
  };
}

/** Reads and checks the environment; creates DATA_DIR and the secret if missing. */
export function loadAppConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const dataDir = resolve(env.DATA_DIR || './data');
  mkdirSync(dataDir, { recursive: true });
  const defaultWeb = resolve(__dirname, '../../../web/dist');
  const webDist = env.WEB_DIST === '' ? null : resolve(env.WEB_DIST || defaultWeb);
  const port = positiveInt('PORT', env.PORT, 3000);
  const host = env.HOST || '127.0.0.1';
  return {
    port,
    host,
    dataDir,
    databaseFile: join(dataDir, 'upwell.sqlite'),
    jwtSecret: jwtSecret(dataDir, env.JWT_SECRET),
    jwtTtlSeconds: positiveInt('JWT_TTL_SECONDS', env.JWT_TTL_SECONDS, 7 * 24 * 3600),
    webDist: webDist && existsSync(join(webDist, 'index.html')) ? webDist : null,
    authAttemptsPerMinute: positiveInt('AUTH_ATTEMPTS_PER_MINUTE', env.AUTH_ATTEMPTS_PER_MINUTE, 20),
    uploadMaxBytes: positiveInt('UPLOAD_MAX_BYTES', env.UPLOAD_MAX_BYTES, 2 * 1024 ** 3),
    ...seedDemo(env.SEED_DEMO, host),
    appOrigin: origin(env.APP_ORIGIN, `http://localhost:${port}`),
    redisUrl: redisUrl(env.REDIS_URL),
    ...mailConfig(env),
    ...heavyWorkConfig(env),
  };
}

function atLeastOne(name: string, raw: string | undefined, fallback: number): number {
  const n = positiveInt(name, raw, fallback);
  if (n < 1) throw new Error(`${name} must be at least 1, got "${raw}"`);
  return n;
}

function heavyWorkConfig(env: NodeJS.ProcessEnv) {
  const uploadMaxBytes = positiveInt('UPLOAD_MAX_BYTES', env.UPLOAD_MAX_BYTES, 2 * 1024 ** 3);
  return {
    jobWorkers: atLeastOne('JOB_WORKERS', env.JOB_WORKERS, availableParallelism()),
    netcdfLimits: {
      maxCells: atLeastOne('NETCDF_MAX_CELLS', env.NETCDF_MAX_CELLS, DEFAULT_NETCDF_LIMITS.maxCells),
      maxReadCells: atLeastOne('NETCDF_MAX_READ_CELLS', env.NETCDF_MAX_READ_CELLS, DEFAULT_NETCDF_LIMITS.maxReadCells),
    },
    uploads: {
      concurrentPerPerson: atLeastOne('UPLOAD_CONCURRENT_PER_PERSON', env.UPLOAD_CONCURRENT_PER_PERSON, 2),
      stagedBytesPerPerson: atLeastOne('UPLOAD_STAGED_BYTES_PER_PERSON', env.UPLOAD_STAGED_BYTES_PER_PERSON, 2 * uploadMaxBytes),
      stagedTtlHours: atLeastOne('UPLOAD_STAGED_TTL_HOURS', env.UPLOAD_STAGED_TTL_HOURS, 24),
      idleTimeoutMs: 1000 * atLeastOne('UPLOAD_IDLE_TIMEOUT_SECONDS', env.UPLOAD_IDLE_TIMEOUT_SECONDS, 60),
    },
  };
}
