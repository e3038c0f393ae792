import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client.ts';
import { pollUnlessRefused, worthRetrying } from './query-client.ts';

const failure = (status: number) => new ApiError(status === 0 || status >= 500 ? 'internal' : 'forbidden', status, 'x');

describe('retry policy of reads', () => {
  it('never retries a 4xx answer', () => {
    for (const status of [400, 401, 403, 404, 409, 410, 422, 429]) expect(worthRetrying(0, failure(status))).toBe(false);
  });

  it('retries a network failure or a 5xx at most twice', () => {
    for (const status of [0, 500, 502, 503]) {
      expect([0, 1, 2, 3].map((n) => worthRetrying(n, failure(status)))).toEqual([true, true, false, false]);
    }
  });

  it('does not retry a bug or an answer of the wrong shape (status 200)', () => {
    expect(worthRetrying(0, new TypeError('x is undefined'))).toBe(false);
    expect(worthRetrying(0, new ApiError('internal', 200, 'Unexpected answer'))).toBe(false);
  });

  it('stops polling once the server refused with a 4xx, keeps polling otherwise', () => {
    const interval = pollUnlessRefused(5000);
    expect(interval({ state: { error: failure(403) } })).toBe(false);
    expect(interval({ state: { error: null } })).toBe(5000);
    expect(interval({ state: { error: failure(503) } })).toBe(5000);
  });
});
