import { SOCKET_MESSAGE_LIMIT } from '@upwell/common';

/** Buckets kept before full (idle) ones are swept away. */
const SWEEP_ABOVE = 1_000;

interface Bucket {
  tokens: number;
  at: number;
}

/**
 * Token buckets of socket messages, one per person (or per socket before its
 * token is checked): each message takes a token, tokens come back at a steady
 * rate up to the burst size. A flood is refused beyond the burst while
 * everyone else keeps their own allowance.
 */
export class SocketRateLimit {
  private readonly buckets = new Map<string, Bucket>();

  constructor(
    private readonly burst: number = SOCKET_MESSAGE_LIMIT.burst,
    private readonly perSecond: number = SOCKET_MESSAGE_LIMIT.perSecond,
  ) {}

  /** Takes one message's token for `key`; false when the allowance is spent. */
  take(key: string, now = Date.now()): boolean {
    const bucket = this.refilled(key, now);
    if (bucket.tokens < 1) return false;
    bucket.tokens -= 1;
    return true;
  }

  private refilled(key: string, now: number): Bucket {
    let bucket = this.buckets.get(key);
    if (!bucket) {
      if (this.buckets.size >= SWEEP_ABOVE) this.sweep(now);
      bucket = { tokens: this.burst, at: now };
      this.buckets.set(key, bucket);
      return bucket;
    }
    bucket.tokens = Math.min(this.burst, bucket.tokens + ((now - bucket.at) / 1000) * this.perSecond);
    bucket.at = now;
    return bucket;
  }

  /** A full bucket is the same as none: forget those. */
  private sweep(now: number): void {
    for (const [key, b] of this.buckets) if (b.tokens + ((now - b.at) / 1000) * this.perSecond >= this.burst) this.buckets.delete(key);
  }
}
