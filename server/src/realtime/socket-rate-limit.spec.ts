import { describe, expect, it } from 'vitest';
import { SocketRateLimit } from './socket-rate-limit';

// Token-bucket arithmetic (common practice: a bucket of `burst` tokens refilled at a fixed rate).
describe('SocketRateLimit', () => {
  it('lets a burst through, refuses the next message, and refills at the stated rate', () => {
    const limit = new SocketRateLimit(5, 10);
    const t0 = 1_000_000;
    expect(Array.from({ length: 6 }, () => limit.take('ana', t0))).toEqual([true, true, true, true, true, false]);
    // 10 per second: after 250 ms two tokens and a half are back, so two messages pass.
    expect([limit.take('ana', t0 + 250), limit.take('ana', t0 + 250), limit.take('ana', t0 + 250)]).toEqual([true, true, false]);
  });

  it('keeps one allowance per person: a flood by one leaves another untouched', () => {
    const limit = new SocketRateLimit(3, 1);
    for (let i = 0; i < 100; i++) limit.take('flooder', 0);
    expect(limit.take('flooder', 0)).toBe(false);
    expect(limit.take('someone else', 0)).toBe(true);
  });

  it('never holds more than the burst, however long the person was quiet', () => {
    const limit = new SocketRateLimit(2, 100);
    limit.take('ana', 0);
    const later = 3_600_000;
    expect([limit.take('ana', later), limit.take('ana', later), limit.take('ana', later)]).toEqual([true, true, false]);
  });
});
