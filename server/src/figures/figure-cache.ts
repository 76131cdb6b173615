import { Injectable } from '@nestjs/common';

/** A stored answer: the JSON of the result without its per-request `cached` flag, and its size. */
interface Entry {
  json: string;
  bytes: number;
}

/** Bounds of the figure cache. */
export interface FigureCacheLimits {
  maxEntries: number;
  maxBytes: number;
}

/** Default bounds: a few hundred figures, at most 64 MB of JSON. */
export const DEFAULT_FIGURE_CACHE_LIMITS: FigureCacheLimits = { maxEntries: 500, maxBytes: 64 * 1024 * 1024 };

/**
 * In-memory least-recently-used cache of computed figures, bounded by entry count and by the
 * size of their JSON. A Map keeps insertion order, so re-inserting on every hit makes its first
 * key the least recently used one. Keys are content hashes (see cache-key.ts), so an entry never
 * goes stale: a new series version or event-set edit gives a new key, and old entries age out.
 */
@Injectable()
export class FigureCache {
  private readonly entries = new Map<string, Entry>();
  private totalBytes = 0;
  hits = 0;
  misses = 0;

  constructor(readonly limits: FigureCacheLimits = DEFAULT_FIGURE_CACHE_LIMITS) {}

  /** The stored JSON for a key, marking it recently used; undefined on a miss. */
  get(key: string): string | undefined {
    const e = this.entries.get(key);
    if (!e) {
      this.misses++;
      return undefined;
    }
    this.hits++;
    this.entries.delete(key);
    this.entries.set(key, e);
    return e.json;
  }

  /** Stores a result, evicting the least recently used entries beyond the bounds; one larger than maxBytes is not kept. */
  set(key: string, json: string): void {
    // A JS string holds UTF-16: two bytes per code unit is what it occupies in memory.
    const bytes = json.length * 2;
    this.delete(key);
    if (bytes > this.limits.maxBytes) return;
    this.entries.set(key, { json, bytes });
    this.totalBytes += bytes;
    while (this.entries.size > this.limits.maxEntries || this.totalBytes > this.limits.maxBytes) {
      const oldest = this.entries.keys().next().value as string;
      this.delete(oldest);
    }
  }

  /** Whether a key is stored (without marking it used). */
  has(key: string): boolean {
    return this.entries.has(key);
  }

  /** Forgets everything (benchmarks measure cold computations this way). */
  clear(): void {
    this.entries.clear();
    this.totalBytes = 0;
  }

  /** Number of stored figures. */
  get size(): number {
    return this.entries.size;
  }

  /** Estimated bytes held. */
  get bytes(): number {
    return this.totalBytes;
  }

  private delete(key: string): void {
    const e = this.entries.get(key);
    if (!e) return;
    this.entries.delete(key);
    this.totalBytes -= e.bytes;
  }
}
