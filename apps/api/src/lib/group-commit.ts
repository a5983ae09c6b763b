import type { Transaction } from 'sequelize';

/**
 * Group commit: writes that arrive while one transaction is under way wait
 * and then go together in the next, each still answered on its own. Every
 * write of the app ends by appending to the audit chain under one row lock,
 * so concurrent transactions queue there one by one; a batch takes the lock
 * (and pays the commit) once for all of its writes.
 *
 * `work` gets the queued jobs in arrival order and returns one outcome per
 * job: a result, or an Error for a job it refused without writing anything
 * (that job alone fails). If `work` throws, or the commit fails, nothing of
 * the batch is kept and every job of it fails with that error.
 */
export class GroupCommit<Job, Result> {
  private queue: { job: Job; resolve: (r: Result) => void; reject: (e: unknown) => void }[] = [];
  private running = false;

  constructor(
    private readonly work: (jobs: Job[], t: Transaction) => Promise<(Result | Error)[]>,
    private readonly inTransaction: <T>(fn: (t: Transaction) => Promise<T>) => Promise<T>,
    private readonly maxBatch = 100,
  ) {}

  submit(job: Job): Promise<Result> {
    return new Promise<Result>((resolve, reject) => {
      this.queue.push({ job, resolve, reject });
      if (!this.running) void this.drain();
    });
  }

  private async drain(): Promise<void> {
    this.running = true;
    try {
      while (this.queue.length > 0) {
        const batch = this.queue.splice(0, this.maxBatch);
        let outcomes: (Result | Error)[];
        try {
          outcomes = await this.inTransaction((t) => this.work(batch.map((b) => b.job), t));
          if (outcomes.length !== batch.length) throw new Error(`group commit: ${outcomes.length} outcomes for ${batch.length} jobs`);
        } catch (e) {
          for (const b of batch) b.reject(e);
          continue;
        }
        batch.forEach((b, i) => {
          const o = outcomes[i] as Result | Error;
          if (o instanceof Error) b.reject(o);
          else b.resolve(o);
        });
      }
    } finally {
      this.running = false;
    }
  }
}
