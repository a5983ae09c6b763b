import type { Transaction } from 'sequelize';
import { describe, expect, it } from 'vitest';

import { GroupCommit } from './group-commit.js';

// A stand-in transaction runner: records each batch, commits or fails on demand.
function runner(opts: { failCommit?: boolean } = {}) {
  const batches: number[][] = [];
  let open = 0;
  let maxOpen = 0;
  const inTransaction = async <T>(fn: (t: Transaction) => Promise<T>): Promise<T> => {
    open++;
    maxOpen = Math.max(maxOpen, open);
    try {
      const r = await fn({} as Transaction);
      await new Promise((res) => setTimeout(res, 5)); // the commit takes a while; more jobs arrive meanwhile
      if (opts.failCommit) throw new Error('commit failed');
      return r;
    } finally {
      open--;
    }
  };
  return { batches, inTransaction, maxOpen: () => maxOpen };
}

describe('GroupCommit', () => {
  it('runs a lone job at once, and the jobs that arrive meanwhile together in the next transaction, in order', async () => {
    const r = runner();
    const g = new GroupCommit<number, string>(async (jobs) => {
      r.batches.push(jobs);
      return jobs.map((j) => `done ${j}`);
    }, r.inTransaction);
    const first = g.submit(1);
    await Promise.resolve();
    const rest = [2, 3, 4, 5].map((j) => g.submit(j));
    expect(await Promise.all([first, ...rest])).toEqual(['done 1', 'done 2', 'done 3', 'done 4', 'done 5']);
    expect(r.batches).toEqual([[1], [2, 3, 4, 5]]);
    expect(r.maxOpen()).toBe(1);
  });

  it('fails only the job the work refused; the others of its batch succeed', async () => {
    const r = runner();
    const g = new GroupCommit<number, number>(async (jobs) => jobs.map((j) => (j === 2 ? new Error('not this one') : j * 10)), r.inTransaction);
    const out = await Promise.allSettled([g.submit(1), g.submit(2), g.submit(3)]);
    expect(out.map((o) => o.status)).toEqual(['fulfilled', 'rejected', 'fulfilled']);
    expect((out[1] as PromiseRejectedResult).reason.message).toBe('not this one');
    expect((out[2] as PromiseFulfilledResult<number>).value).toBe(30);
  });

  it('fails every job of a batch whose commit fails, and goes on with later jobs', async () => {
    const failing = runner({ failCommit: true });
    const g = new GroupCommit<number, number>(async (jobs) => jobs, failing.inTransaction);
    const out = await Promise.allSettled([g.submit(1), g.submit(2)]);
    expect(out.every((o) => o.status === 'rejected' && (o.reason as Error).message === 'commit failed')).toBe(true);
  });

  it('fails the batch whose work throws (the first job goes alone), and serves the next batch', async () => {
    const r = runner();
    let calls = 0;
    const g = new GroupCommit<number, number>(async (jobs) => {
      calls++;
      if (calls === 1) throw new Error('database gone');
      return jobs;
    }, r.inTransaction);
    const out = await Promise.allSettled([g.submit(1), g.submit(2), g.submit(3)]);
    expect(out.map((o) => o.status)).toEqual(['rejected', 'fulfilled', 'fulfilled']);
    expect((out[0] as PromiseRejectedResult).reason.message).toBe('database gone');
    expect(await g.submit(7)).toBe(7);
  });

  it('caps a batch at maxBatch jobs (the first one goes alone, at once)', async () => {
    const r = runner();
    const g = new GroupCommit<number, number>(
      async (jobs) => {
        r.batches.push(jobs);
        return jobs;
      },
      r.inTransaction,
      2,
    );
    await Promise.all([1, 2, 3, 4, 5].map((j) => g.submit(j)));
    expect(r.batches).toEqual([[1], [2, 3], [4, 5]]);
  });
});
