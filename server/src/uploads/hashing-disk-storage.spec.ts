import { existsSync, mkdtempSync, readdirSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { hostname, tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { sweepStaleParts } from './hashing-disk-storage';

describe('sweepStaleParts()', () => {
  const dir = mkdtempSync(join(tmpdir(), 'upwell-parts-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const host = hostname().replace(/[^A-Za-z0-9-]/g, '_');

  it('removes at once the parts of a dead process of this host, and parts untouched for longer than the idle timeout; keeps live ones', () => {
    // pid 2^22 + 1 is above Linux's default pid_max (2^22), so no process has it (proc(5), /proc/sys/kernel/pid_max).
    const dead = `${host}.${2 ** 22 + 1}.a.part`;
    const mine = `${host}.${process.pid}.b.part`;
    const otherHost = 'another-host.1234.c.part';
    const oldUnnamed = 'old.part';
    for (const n of [dead, mine, otherHost, oldUnnamed, 'keep.txt']) writeFileSync(join(dir, n), 'x');
    const old = new Date(Date.now() - 5 * 60_000);
    utimesSync(join(dir, oldUnnamed), old, old);
    expect(sweepStaleParts(dir, 60_000)).toBe(2);
    expect(readdirSync(dir).sort()).toEqual([mine, otherHost, 'keep.txt'].sort());
    expect(existsSync(join(dir, dead))).toBe(false);
  });
});
