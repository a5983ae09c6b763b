import { describe, expect, it } from 'vitest';

import { KeptReads } from './kept-reads.js';

describe('KeptReads', () => {
  it('When a read fails, then the failure is not kept: the next get reads again', async () => {
    const kept = new KeptReads<string, number>({ max: 10, ttlMs: 60_000 });
    let calls = 0;
    const load = async () => {
      calls++;
      if (calls === 1) throw new Error('database down');
      return 42;
    };
    await expect(kept.get('a', load)).rejects.toThrow('database down');
    expect(await kept.get('a', load)).toBe(42);
    expect(await kept.get('a', load)).toBe(42);
    expect(calls).toBe(2);
  });

  it('When forgetWhere matches some values, then only those are read again', async () => {
    const kept = new KeptReads<string, { owner: number }>({ max: 10, ttlMs: 60_000 });
    const calls: string[] = [];
    const load = async (k: string) => {
      calls.push(k);
      return { owner: k === 'x' ? 1 : 2 };
    };
    await kept.get('x', load);
    await kept.get('y', load);
    kept.forgetWhere((v) => v.owner === 1);
    await kept.get('x', load);
    await kept.get('y', load);
    expect(calls).toEqual(['x', 'y', 'x']);
  });

  it('When the kept copy is older than ttlMs, then it is read again', async () => {
    const kept = new KeptReads<string, number>({ max: 10, ttlMs: 20 });
    let n = 0;
    const load = async () => ++n;
    expect(await kept.get('k', load)).toBe(1);
    expect(await kept.get('k', load)).toBe(1);
    await new Promise((r) => setTimeout(r, 40));
    expect(await kept.get('k', load)).toBe(2);
  });
});
