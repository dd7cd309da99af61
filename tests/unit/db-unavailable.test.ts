import { describe, expect, it } from 'vitest';
import { isDatabaseUnavailable } from '../../server/lib/db-unavailable';

const pgError = (code: string, message = 'x') => Object.assign(new Error(message), { code });
/** Drizzle wraps the driver's error as the cause of its own "Failed query" error. */
const wrapped = (cause: Error) => Object.assign(new Error('Failed query: select 1'), { cause });

describe('which errors mean the database is away (answered 503)', () => {
  it.each([
    [
      'a restart or failover ending the connection (57P01)',
      pgError('57P01', 'terminating connection due to administrator command'),
    ],
    ['a server still starting (57P03)', pgError('57P03', 'the database system is starting up')],
    ['a refused connection', pgError('ECONNREFUSED', 'connect ECONNREFUSED 127.0.0.1:5432')],
    ['a dropped connection', new Error('Connection terminated unexpectedly')],
    ['no free connection in time', new Error('timeout exceeded when trying to connect')],
    ['a server that does not answer', new Error('Query read timeout')],
    ['statement_timeout (57014)', pgError('57014', 'canceling statement due to statement timeout')],
    ['a connection exception class 08 (08006)', pgError('08006')],
  ])('%s, also when Drizzle wraps it', (_what, error) => {
    expect(isDatabaseUnavailable(error)).toBe(true);
    expect(isDatabaseUnavailable(wrapped(error))).toBe(true);
  });

  it.each([
    ['a unique violation (23505)', pgError('23505', 'duplicate key value')],
    ['an invalid value (22P02)', pgError('22P02', 'invalid input syntax for type uuid')],
    ['a plain programming error', new TypeError('x is not a function')],
  ])('not %s', (_what, error) => {
    expect(isDatabaseUnavailable(wrapped(error))).toBe(false);
  });
});
