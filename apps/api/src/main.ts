import cluster from 'node:cluster';

import { runCluster } from './cluster.js';
import { ConfigError, loadConfig } from './config.js';
import { logger } from './lib/logger.js';
import { start, stop } from './server.js';

let asParent: boolean;
try {
  const processes = loadConfig().API_PROCESSES;
  asParent = cluster.isPrimary && processes > 1;
  if (asParent) {
    // The parent: services once, HTTP in the forked processes (cluster.ts); its own signal handling.
    await runCluster(processes);
  } else {
    const { url } = await start({}, { mailSender: cluster.isWorker ? 'parent' : 'here' });
    logger.info(cluster.isWorker ? `API process ${process.pid} listening on ${url}` : `serving on ${url}`);
  }
} catch (err) {
  if (err instanceof ConfigError) {
    console.error(err.message);
    process.exit(78);
  }
  throw err;
}

let stopping = false;
async function shutdown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  logger.info(`${signal}: stopping`);
  await stop();
  process.exit(0);
}
if (!asParent) {
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}
process.on('unhandledRejection', (err) => logger.error('unhandled rejection', err));
