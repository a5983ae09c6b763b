import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';

import type { Sequelize } from 'sequelize';

import { buildApp } from './app.js';
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
}

let running: Running | null = null;
let closeApp: (() => void) | null = null;

/** Starts the API (and the built client, if present). Port 0 picks a free port. */
export async function start(overrides: Partial<Record<string, string>> = {}): Promise<Running> {
  if (running) return running;
  const config = loadConfig({ ...process.env, ...overrides });
  logger.setLevel(config.LOG_LEVEL);
  const sequelize = createSequelize(config);
  initModels(sequelize);
  setSequelize(sequelize);
  const built = buildApp(config, sequelize);
  closeApp = built.close;
  const server = await new Promise<Server>((resolve, reject) => {
    const s = built.app.listen(config.PORT, config.HOST, () => resolve(s));
    s.once('error', reject);
  });
  const port = (server.address() as AddressInfo).port;
  running = { url: `http://${config.HOST}:${port}`, port, server, sequelize, config };
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
  await sequelize.close();
}
