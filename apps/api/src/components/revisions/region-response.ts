import type { RegionResponse, Viewport } from '@polecourt/contracts';
import { regionBounds, regionPolygons } from '@polecourt/spec';
import LRUCache from 'lru-cache';

import { AppError } from '../../lib/app-error.js';
import { defaultViewport, mergeViewport } from './region-viewport.js';

// The region is a pure function of the requirements and the window, and
// tracing its polygons costs about 1.5 ms, while every plot of a revision asks
// for the same few windows: so responses are kept, a bounded number of them.
// The same object comes back for the same question (sendJson keeps its
// serialised form beside it); entries are shared and never mutated.
const cache = new LRUCache<string, RegionResponse>({ max: 500 });

export function regionResponse(revisionId: number, requirements: Record<string, number>, given: Partial<Viewport>): RegionResponse {
  const key = `${revisionId}|${JSON.stringify(requirements)}|${given.reMin}|${given.reMax}|${given.imMin}|${given.imMax}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const bounds = regionBounds(requirements);
  const viewport = mergeViewport(defaultViewport(bounds), given);
  if (!(viewport.reMin < viewport.reMax)) throw AppError.badRequest('invalid_query', 'reMin must be less than reMax.', { reMin: 'must be less than reMax' });
  if (!(viewport.imMin < viewport.imMax)) throw AppError.badRequest('invalid_query', 'imMin must be less than imMax.', { imMin: 'must be less than imMax' });
  const polygons = regionPolygons(bounds, viewport);
  const response: RegionResponse = { revisionId, viewport, bounds: bounds as unknown as Record<string, unknown>, polygons: polygons as unknown as Record<string, unknown> };
  cache.set(key, response);
  return response;
}
