import LRUCache from 'lru-cache';

/**
 * Reads kept for a short while (ttlMs), for what every request needs and
 * rarely changes: the session, the signed-in user, an API token. While a
 * key is being read, further requests for it wait on that one read instead
 * of issuing their own, so a kept copy running out under load costs one
 * query, not one per request in flight.
 *
 * forget(key) is called on every change: it drops the kept copy and the read
 * under way, so a request after the change reads anew, and what a read that
 * began before the change returns is not kept.
 */
export class KeptReads<K, V> {
  private readonly kept: LRUCache<K, { value: V }>;
  private readonly reading = new Map<K, Promise<V>>();

  constructor(options: { max: number; ttlMs: number }) {
    this.kept = new LRUCache<K, { value: V }>({ max: options.max, ttl: Math.max(1, options.ttlMs) });
  }

  get(key: K, load: (key: K) => Promise<V>): Promise<V> {
    const hit = this.kept.get(key);
    if (hit) return Promise.resolve(hit.value);
    let read = this.reading.get(key);
    if (!read) {
      const mine: Promise<V> = load(key).then(
        (value) => {
          if (this.reading.get(key) === mine) {
            this.reading.delete(key);
            this.kept.set(key, { value });
          }
          return value;
        },
        (err: unknown) => {
          if (this.reading.get(key) === mine) this.reading.delete(key);
          throw err;
        },
      );
      this.reading.set(key, mine);
      read = mine;
    }
    return read;
  }

  forget(key: K): void {
    this.kept.delete(key);
    this.reading.delete(key);
  }

  /** Drops every kept copy whose value matches (and every read under way). */
  forgetWhere(match: (value: V) => boolean): void {
    const drop = [...this.kept.entries()].filter(([, entry]) => match(entry.value)).map(([key]) => key);
    for (const key of drop) this.kept.delete(key);
    this.reading.clear();
  }
}
