import { ConfigError } from './config.js';
import { logger } from './lib/logger.js';
import { start, stop } from './server.js';

try {
  const { url } = await start();
  logger.info(`serving on ${url}`);
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
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('unhandledRejection', (err) => logger.error('unhandled rejection', err));
