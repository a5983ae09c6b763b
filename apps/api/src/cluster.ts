import cluster, { type Worker } from 'node:cluster';

import { logger } from './lib/logger.js';
import { MAIL_KICK, startServices } from './server.js';

/** A crashed HTTP process is started again after this long (a crash loop does not spin). */
const RESTART_DELAY_MS = 1000;

/**
 * API_PROCESSES > 1: this process (the cluster's parent) runs the services
 * that must exist once (startServices) and forks that many HTTP processes,
 * which share PORT through node:cluster. The HTTP processes keep no state of
 * their own beyond short caches (see the README's "Scale beyond one
 * machine"), so any of them may answer any request. One that crashes is
 * started again; SIGINT or SIGTERM stops them all, then the services.
 */
export async function runCluster(processes: number): Promise<void> {
  const services = await startServices();
  const { config } = services;
  let stopping = false;
  let announced = false;
  const listening = new Set<number>();

  const fork = (): Worker => {
    const worker = cluster.fork({ ...services.childEnv, POLECOURT_CLUSTER_CHILD: '1' });
    worker.on('message', (m: unknown) => {
      if (m === MAIL_KICK) services.kickMail();
    });
    worker.on('listening', (address) => {
      listening.add(worker.id);
      if (!announced && listening.size === processes) {
        announced = true;
        logger.info(`${processes} API processes`);
        logger.info(`serving on http://${config.HOST}:${address.port}`);
      }
    });
    worker.on('exit', (code, signal) => {
      listening.delete(worker.id);
      if (stopping) return;
      // Exit 0 is a process that stopped on a signal of its own (Ctrl-C reaches the whole group).
      if (code === 0) return;
      logger.error(`API process ${worker.process.pid} ended (${signal ?? `exit ${code}`}); starting another`);
      setTimeout(() => {
        if (!stopping) fork();
      }, RESTART_DELAY_MS);
    });
    return worker;
  };
  for (let i = 0; i < processes; i++) fork();

  const shutdown = async (signal: string): Promise<void> => {
    if (stopping) return;
    stopping = true;
    logger.info(`${signal}: stopping ${Object.keys(cluster.workers ?? {}).length} API processes`);
    await Promise.all(
      Object.values(cluster.workers ?? {}).map(
        (w) =>
          new Promise<void>((resolve) => {
            if (!w || w.isDead()) return resolve();
            w.once('exit', () => resolve());
            w.process.kill('SIGTERM');
          }),
      ),
    );
    await services.stop();
    process.exit(0);
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

