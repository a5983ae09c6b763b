import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';

import type { Sequelize } from 'sequelize';

import { buildApp } from './app.js';
import { startMailFake, type MailFake } from './components/mail/mail-fake.js';
import { setPublicUrl } from './components/mail/mail-settings.js';
import { startMailWorker, type MailWorker } from './components/mail/mail-worker.js';
import { createMailTransport } from './components/mail/transport.js';
import { registerMailWorker } from './components/mail/worker-registry.js';
import { FAKE_KEY } from './components/reports/settings.js';
import { startReportServices, type RunningReportServices } from './components/reports/start-report-services.js';
import { loadConfig, type Config } from './config.js';
import { initModels } from './db/models.js';
import { createSequelize } from './db/sequelize.js';
import { logger } from './lib/logger.js';
import { setSequelize } from './lib/transaction.js';

export interface Running {
  url: string;
  port: number;
  server: Server;
  sequelize: Sequelize;
  config: Config;
  /** The local mail fake's address when MAIL_FAKE=true. */
  mailFake: { host: string; port: number } | null;
  /** The local object-storage fake's endpoint when it runs (S3_FAKE). */
  s3Endpoint: string | null;
}

let running: Running | null = null;
let closeApp: (() => void) | null = null;
let reports: RunningReportServices | null = null;
interface MailPieces {
  fake: MailFake | null;
  worker: MailWorker | null;
  closeTransport: () => void;
}
let mail: MailPieces | null = null;

/** The sender finishes the send in hand; the fake stores what it received. */
async function closeMail({ fake, worker, closeTransport }: MailPieces): Promise<void> {
  registerMailWorker(null);
  await worker?.stop();
  closeTransport();
  await fake?.close();
}

async function stopMail(): Promise<void> {
  if (!mail) return;
  const pieces = mail;
  mail = null;
  await closeMail(pieces);
}

/** The message a cluster's HTTP process sends its parent when it has queued mail. */
export const MAIL_KICK = 'polecourt:mail-kick';

export interface StartOptions {
  /**
   * Where queued mail is sent from: this process (the default), or the
   * cluster parent, woken over IPC (cluster.ts), so that one sender runs
   * however many HTTP processes there are.
   */
  mailSender?: 'here' | 'parent';
}

function openDatabase(config: Config): Sequelize {
  logger.setLevel(config.LOG_LEVEL);
  const sequelize = createSequelize(config);
  initModels(sequelize);
  setSequelize(sequelize);
  return sequelize;
}

// The mail fake first, so the transport knows its real port (SMTP_PORT=0 picks one).
async function startMailFakeIfSet(config: Config, sequelize: Sequelize): Promise<MailFake | null> {
  if (!config.MAIL_FAKE) return null;
  return startMailFake(config.SMTP_PORT).catch(async (err: unknown) => {
    await sequelize.close();
    const why = err instanceof Error ? err.message : String(err);
    throw new Error(`The local mail fake could not listen on 127.0.0.1:${config.SMTP_PORT} (${why}); set SMTP_PORT to a free port.`);
  });
}

function startMailSender(config: Config, transport: ReturnType<typeof createMailTransport>): MailWorker {
  const worker = startMailWorker({
    transport,
    from: config.MAIL_FROM,
    maxAttempts: config.MAIL_MAX_ATTEMPTS,
    retryBaseMs: config.MAIL_RETRY_BASE_MS,
    pollMs: config.MAIL_POLL_MS,
  });
  registerMailWorker(worker.kick);
  return worker;
}

/** Starts the API (and the built client, if present). Port 0 picks a free port. */
export async function start(overrides: Partial<Record<string, string>> = {}, options: StartOptions = {}): Promise<Running> {
  if (running) return running;
  const config = loadConfig({ ...process.env, ...overrides });
  const sequelize = openDatabase(config);
  const sendsMail = options.mailSender !== 'parent';
  const fake = sendsMail ? await startMailFakeIfSet(config, sequelize) : null;
  const transport = sendsMail ? createMailTransport(config, fake) : null;
  mail = { fake, worker: null, closeTransport: () => transport?.close() };
  // The signing certificate (made on first start) and the report archive (its local fake if S3_FAKE).
  try {
    reports = await startReportServices(config);
  } catch (err) {
    await stopMail();
    await sequelize.close();
    throw err;
  }
  const built = buildApp(config, sequelize);
  closeApp = built.close;
  let server: Server;
  try {
    server = await new Promise<Server>((resolve, reject) => {
      const s = built.app.listen(config.PORT, config.HOST, () => resolve(s));
      s.once('error', reject);
    });
  } catch (err) {
    closeApp();
    closeApp = null;
    await stopMail();
    await reports?.stop();
    reports = null;
    await sequelize.close();
    throw err;
  }
  const port = (server.address() as AddressInfo).port;
  const url = `http://${config.HOST}:${port}`;
  setPublicUrl(config.PUBLIC_URL ?? url);
  if (transport) mail.worker = startMailSender(config, transport);
  else registerMailWorker(() => process.send?.(MAIL_KICK));
  if (fake) logger.info(`mail goes to the local fake on ${fake.host}:${fake.port}; admins read it under Outbox`);
  running = { url, port, server, sequelize, config, mailFake: fake ? { host: fake.host, port: fake.port } : null, s3Endpoint: reports.s3Fake?.endpoint ?? null };
  return running;
}

export interface RunningServices {
  config: Config;
  /** Settings for the HTTP processes: they reach the fakes this process runs like any mail or object-storage server. */
  childEnv: Record<string, string>;
  /** Wakes the mail sender (an HTTP process queued mail). */
  kickMail(): void;
  stop(): Promise<void>;
}

/**
 * The parent of a cluster: everything but HTTP. It makes the signing
 * certificate (once, before any HTTP process loads it), runs the mail fake,
 * the mail sender and the object-storage fake, and says how to reach them.
 */
export async function startServices(overrides: Partial<Record<string, string>> = {}): Promise<RunningServices> {
  const config = loadConfig({ ...process.env, ...overrides });
  const sequelize = openDatabase(config);
  const fake = await startMailFakeIfSet(config, sequelize);
  const transport = createMailTransport(config, fake);
  let services: RunningReportServices;
  try {
    services = await startReportServices(config);
  } catch (err) {
    transport.close();
    await fake?.close();
    await sequelize.close();
    throw err;
  }
  const sender = startMailSender(config, transport);
  const childEnv: Record<string, string> = {};
  if (fake) {
    Object.assign(childEnv, { MAIL_FAKE: 'false', SMTP_HOST: fake.host, SMTP_PORT: String(fake.port), SMTP_SECURE: 'false' });
    logger.info(`mail goes to the local fake on ${fake.host}:${fake.port}; admins read it under Outbox`);
  }
  if (services.s3Fake) {
    Object.assign(childEnv, { S3_FAKE: 'false', S3_ENDPOINT: services.s3Fake.endpoint, S3_FORCE_PATH_STYLE: 'true', S3_ACCESS_KEY_ID: FAKE_KEY, S3_SECRET_ACCESS_KEY: FAKE_KEY });
  }
  return {
    config,
    childEnv,
    kickMail: sender.kick,
    async stop() {
      await closeMail({ fake, worker: sender, closeTransport: () => transport.close() });
      await services.stop();
      await sequelize.close();
    },
  };
}

export async function stop(): Promise<void> {
  if (!running) return;
  const { server, sequelize } = running;
  running = null;
  closeApp?.();
  closeApp = null;
  server.closeAllConnections();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await stopMail();
  await reports?.stop();
  reports = null;
  await sequelize.close();
}
