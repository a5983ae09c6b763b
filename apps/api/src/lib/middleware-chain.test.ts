import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { describe, expect, it } from 'vitest';

import { middlewareChain } from './middleware-chain.js';

const req = {} as Request;
const res = {} as Response;

function run(chain: RequestHandler): Promise<unknown> {
  return new Promise((resolve) => chain(req, res, ((err?: unknown) => resolve(err ?? 'done')) as NextFunction));
}

describe('middlewareChain', () => {
  it('runs the middlewares in order, then calls next once', async () => {
    const seen: number[] = [];
    const mw = (n: number): RequestHandler => (_q, _s, next) => {
      seen.push(n);
      next();
    };
    expect(await run(middlewareChain(mw(1), mw(2), mw(3)))).toBe('done');
    expect(seen).toEqual([1, 2, 3]);
  });

  it('waits for a middleware that calls next later', async () => {
    const seen: string[] = [];
    const later: RequestHandler = (_q, _s, next) => void setTimeout(() => (seen.push('later'), next()), 5);
    const after: RequestHandler = (_q, _s, next) => (seen.push('after'), next());
    expect(await run(middlewareChain(later, after))).toBe('done');
    expect(seen).toEqual(['later', 'after']);
  });

  it('passes a thrown error on and skips the rest', async () => {
    let reached = false;
    const boom = new Error('boom');
    const thrower: RequestHandler = () => {
      throw boom;
    };
    const rest: RequestHandler = (_q, _s, next) => ((reached = true), next());
    expect(await run(middlewareChain(thrower, rest))).toBe(boom);
    expect(reached).toBe(false);
  });

  it('passes a rejected promise on (an async middleware that throws)', async () => {
    const boom = new Error('async boom');
    const asyncThrower: RequestHandler = async () => {
      await Promise.resolve();
      throw boom;
    };
    expect(await run(middlewareChain(asyncThrower))).toBe(boom);
  });

  it('passes an error given to next on and skips the rest', async () => {
    let reached = false;
    const boom = new Error('next boom');
    const failing: RequestHandler = (_q, _s, next) => next(boom);
    const rest: RequestHandler = (_q, _s, next) => ((reached = true), next());
    expect(await run(middlewareChain(failing, rest))).toBe(boom);
    expect(reached).toBe(false);
  });
});
