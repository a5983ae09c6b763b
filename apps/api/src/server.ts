import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';

import type { Sequelize } from 'sequelize';

import { buildApp } from './app.js';
import { startMailFake, type MailFake } from './components/mail/mail-fake.js';
import { setPublicUrl } from './components/mail/mail-settings.js';
import { startMailWorker, type MailWorker } from './components/mail/mail-worker.js';
import { createMailTransport } from './components/mail/transport.js';
import { registerMailWorker } from './components/mail/worker-registry.js';
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
let mail: { fake: MailFake | null; worker: MailWorker | null; closeTransport: () => void } | null = null;

async function stopMail(): Promise<void> {
  if (!mail) return;
  const { fake, worker, closeTransport } = mail;
  mail = null;
  registerMailWorker(null);
  await worker?.stop();
  closeTransport();
  await fake?.close();
}

/** Starts the API (and the built client, if present). Port 0 picks a free port. */
export async function start(overrides: Partial<Record<string, string>> = {}): Promise<Running> {
  if (running) return running;
  const config = loadConfig({ ...process.env, ...overrides });
  logger.setLevel(config.LOG_LEVEL);
  const sequelize = createSequelize(config);
  initModels(sequelize);
  setSequelize(sequelize);
  // The mail fake first, so the transport knows its real port (SMTP_PORT=0 picks one).
  const fake = config.MAIL_FAKE
    ? await startMailFake(config.SMTP_PORT).catch(async (err: unknown) => {
        await sequelize.close();
        const why = err instanceof Error ? err.message : String(err);
        throw new Error(`The local mail fake could not listen on 127.0.0.1:${config.SMTP_PORT} (${why}); set SMTP_PORT to a free port.`);
      })
    : null;
  const transport = createMailTransport(config, fake);
  mail = { fake, worker: null, closeTransport: () => transport.close() };
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
  const worker = startMailWorker({
    transport,
    from: config.MAIL_FROM,
    maxAttempts: config.MAIL_MAX_ATTEMPTS,
    retryBaseMs: config.MAIL_RETRY_BASE_MS,
    pollMs: config.MAIL_POLL_MS,
  });
  mail.worker = worker;
  registerMailWorker(worker.kick);
  if (fake) logger.info(`mail goes to the local fake on ${fake.host}:${fake.port}; admins read it under Outbox`);
  running = { url, port, server, sequelize, config, mailFake: fake ? { host: fake.host, port: fake.port } : null, s3Endpoint: reports.s3Fake?.endpoint ?? null };
  return running;
}

export async function stop(): Promise<void> {
  if (!running) return;
  const { server, sequelize } = running;
  running = null;
  closeApp?.();
  closeApp = null;
  server.closeAllConnections();
  await new Promise<void>((resolve) => server.close(() => resolve()));
  // The worker finishes the send in hand; the fake stores what it received.
  await stopMail();
  await reports?.stop();
  reports = null;
  await sequelize.close();
}
