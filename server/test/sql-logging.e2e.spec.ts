import { EntityManager } from '@mikro-orm/sqlite';
import { Logger, type ArgumentsHost } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { AllExceptionsFilter } from '../src/common/all-exceptions.filter';
import { hashPassword } from '../src/auth/password';
import { buildOrmOptions } from '../src/mikro-orm.config';
import { User } from '../src/users/user.entity';
import { buildUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

/**
 * Issue 23 item 5, second half: a failed sign-up's log line held the whole SQL
 * statement with the e-mail and the password hash (MikroORM inlines parameters
 * into the statement, and the driver's error repeats it).
 */
describe('no SQL parameters in the log', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('a failed insert reaches the log as its table and constraint, without the e-mail or the password hash', async () => {
    const taken = await buildUser(t.url);
    const passwordHash = await hashPassword('a secret nobody may read in a log');
    let failure: unknown;
    try {
      // A real failed insert into the real database: the e-mail is taken (unique index on users.email).
      await t.app.get(EntityManager).fork().insert(User, { id: randomUUID(), email: taken.user.email, name: 'Second', passwordHash, tokenVersion: 0, emailNotifications: true, createdAt: new Date() });
    } catch (err) {
      failure = err;
    }
    expect(failure, 'the insert must fail').toBeInstanceOf(Error);
    // Control: the driver's own message does hold the values, which is why the log must not repeat it.
    expect((failure as Error).message).toContain(passwordHash);

    const logged: string[] = [];
    const spy = vi.spyOn(Logger.prototype, 'error').mockImplementation((...args: unknown[]) => void logged.push(args.map(String).join(' ')));
    const res = { headersSent: false, status: vi.fn().mockReturnThis(), json: vi.fn().mockReturnThis() };
    const host = { getType: () => 'http', switchToHttp: () => ({ getResponse: () => res }) } as unknown as ArgumentsHost;
    try {
      new AllExceptionsFilter().catch(failure, host);
    } finally {
      spy.mockRestore();
    }
    expect(res.status).toHaveBeenCalledWith(500);
    const log = logged.join('\n');
    expect(log).toMatch(/UNIQUE constraint failed: users\.email/);
    expect(log).not.toContain(passwordHash);
    expect(log).not.toContain('$argon2id$');
    expect(log).not.toContain(taken.user.email);
    expect(log).not.toMatch(/insert into/i);
  });

  it('MikroORM’s logger never logs parameters, even with query logging and query-params asked for', () => {
    const options = buildOrmOptions(':memory:');
    const lines: string[] = [];
    const logger = options.loggerFactory!({ writer: (m) => lines.push(m), debugMode: ['query', 'query-params'] });
    expect(logger.isEnabled('query')).toBe(true);
    expect(logger.isEnabled('query-params')).toBe(false);
  });

  it('sign-ups racing for one address: one 201, the others 409, never a 500', async () => {
    const email = `race.${process.pid}.${Date.now()}@example.org`;
    const statuses = await Promise.all(
      Array.from({ length: 6 }, (_, i) => request(t.url).post('/api/auth/register').send({ name: `Racer ${i}`, email, password: 'correct horse battery' }).then((r) => r.status)),
    );
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(5);
  });
});
