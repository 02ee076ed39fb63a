import { LoginAttemptsService } from './login-attempts.service.js';

const config = { ttlMs: 60_000, limit: 1200, loginTtlMs: 60_000, loginLimit: 4, loginAccountLimit: 2 };

describe('LoginAttemptsService', () => {
  const at = 1_000_000;

  it('locks an account after its limit of failures, from any address, until the window ends', () => {
    const attempts = new LoginAttemptsService(config);
    attempts.recordFailure('Priya@Example.test', 'a', at);
    expect(attempts.retryAfterSeconds('priya@example.test', 'b', at)).toBe(0);
    attempts.recordFailure(' priya@example.test', 'b', at + 10_000);
    // The window started with the first failure: 60 s from `at`.
    expect(attempts.retryAfterSeconds('priya@example.test', 'c', at + 10_000)).toBe(50);
    expect(attempts.retryAfterSeconds('other@example.test', 'c', at + 10_000)).toBe(0);
    expect(attempts.retryAfterSeconds('priya@example.test', 'c', at + 60_000)).toBe(0);
  });

  it('locks an address after its limit, whichever accounts were tried', () => {
    const attempts = new LoginAttemptsService(config);
    for (const email of ['a@x.test', 'b@x.test', 'c@x.test', 'd@x.test'])
      attempts.recordFailure(email, 'ip', at);
    expect(attempts.retryAfterSeconds('e@x.test', 'ip', at + 1)).toBe(60);
    expect(attempts.retryAfterSeconds('e@x.test', 'other-ip', at + 1)).toBe(0);
  });

  it('a success clears the account’s failures but not the address’s', () => {
    const attempts = new LoginAttemptsService({ ...config, loginLimit: 2 });
    attempts.recordFailure('a@x.test', 'ip', at);
    attempts.recordFailure('a@x.test', 'ip', at);
    attempts.recordSuccess('a@x.test');
    expect(attempts.retryAfterSeconds('a@x.test', 'elsewhere', at)).toBe(0);
    expect(attempts.retryAfterSeconds('a@x.test', 'ip', at)).toBe(60);
  });
});
