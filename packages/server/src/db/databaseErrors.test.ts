import { describe, expect, it } from 'vitest';
import { isDatabaseUnavailable } from './databaseErrors';

describe('isDatabaseUnavailable', () => {
  it('recognises a server restart, a refused connection and a pool timeout, however wrapped', () => {
    const shutdown = Object.assign(new Error('terminating connection due to administrator command'), { code: '57P01' });
    expect(isDatabaseUnavailable(shutdown)).toBe(true);
    // TypeORM's QueryFailedError keeps the driver's error.
    expect(isDatabaseUnavailable(Object.assign(new Error('query failed'), { driverError: shutdown }))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' }))).toBe(true);
    expect(isDatabaseUnavailable(new Error('Connection terminated unexpectedly'))).toBe(true);
    expect(isDatabaseUnavailable(new Error('timeout exceeded when trying to connect'))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error('the database system is starting up'), { code: '57P03' }))).toBe(true);
    const refused = Object.assign(new Error('refused'), { code: 'ECONNREFUSED' });
    expect(isDatabaseUnavailable(new AggregateError([refused, refused], ''))).toBe(true);
    expect(isDatabaseUnavailable(new Error('outer', { cause: refused }))).toBe(true);
  });

  it('leaves errors of the query itself alone', () => {
    expect(isDatabaseUnavailable(Object.assign(new Error('duplicate key value'), { code: '23505' }))).toBe(false);
    expect(isDatabaseUnavailable(Object.assign(new Error('permission denied for table revisions'), { code: '42501' }))).toBe(false);
    expect(isDatabaseUnavailable(new Error('something else'))).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
    expect(isDatabaseUnavailable('ECONNREFUSED')).toBe(false);
  });
});
