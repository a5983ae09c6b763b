import type { Transporter } from 'nodemailer';

import { logger } from '../../lib/logger.js';
import { mailQueueRepository, type QueuedMail } from './queue-repository.js';

export interface MailWorkerOptions {
  transport: Transporter;
  from: string;
  maxAttempts: number;
  /** Wait before the 2nd try; doubled before each one after it. */
  retryBaseMs: number;
  /** How often the queue is looked at when nobody kicks the worker. */
  pollMs: number;
}

export interface MailWorker {
  kick(): void;
  stop(): Promise<void>;
}

const BATCH = 20;
// A send that has not finished in this long belonged to a process that stopped.
const STALE_SENDING_MS = 5 * 60 * 1000;

/** Delay before attempt n+1 after n failed attempts: base, 2 base, 4 base, ... */
export function retryDelayMs(failedAttempts: number, baseMs: number): number {
  return baseMs * 2 ** Math.max(0, failedAttempts - 1);
}

/**
 * A small in-process sender: takes due rows from mail_queue one at a time,
 * sends them over SMTP and records the outcome. A failed send is tried again
 * later with a doubling delay, up to maxAttempts, then left as "failed" with
 * its last error. Errors here never reach a request.
 */
export function startMailWorker(options: MailWorkerOptions): MailWorker {
  let stopped = false;
  let timer: NodeJS.Timeout | null = null;
  let running: Promise<void> | null = null;
  let again = false;

  async function sendOne(mail: QueuedMail): Promise<void> {
    if (!(await mailQueueRepository.claim(mail.id))) return;
    const attempts = mail.attempts + 1;
    try {
      const info = await options.transport.sendMail({
        from: options.from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        ...(mail.html ? { html: mail.html } : {}),
      });
      await mailQueueRepository.markSent(mail.id, attempts, typeof info.messageId === 'string' ? info.messageId : null, new Date());
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      const retryAt = attempts < options.maxAttempts ? new Date(Date.now() + retryDelayMs(attempts, options.retryBaseMs)) : null;
      await mailQueueRepository.markAttemptFailed(mail.id, attempts, message, retryAt);
      if (!retryAt) logger.error(`mail ${mail.id} (${mail.kind}) to ${mail.to} failed after ${attempts} attempts: ${message}`);
    }
  }

  async function drain(): Promise<void> {
    for (;;) {
      if (stopped) return;
      const due = await mailQueueRepository.listDue(new Date(), BATCH);
      for (const mail of due) {
        if (stopped) return;
        await sendOne(mail);
      }
      if (due.length < BATCH) return;
    }
  }

  function schedule(): void {
    if (stopped) return;
    if (timer) clearTimeout(timer);
    timer = setTimeout(run, options.pollMs);
    timer.unref();
  }

  function run(): void {
    if (stopped) return;
    if (running) {
      again = true; // a kick during a pass: look once more right after it
      return;
    }
    running = (async () => {
      try {
        do {
          again = false;
          await drain();
        } while (again && !stopped);
      } catch (err) {
        // Most likely the database is away; the next pass tries again.
        logger.error('mail worker pass failed', err);
      } finally {
        running = null;
        schedule();
      }
    })();
  }

  const ready = mailQueueRepository
    .requeueStale(new Date(Date.now() - STALE_SENDING_MS))
    .catch((err: unknown) => logger.error('mail worker could not requeue stale rows', err))
    .finally(run);

  return {
    kick: run,
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      timer = null;
      await ready;
      await running;
    },
  };
}
