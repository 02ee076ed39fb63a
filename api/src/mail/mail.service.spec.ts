import { retryDelayMs } from './mail.service.js';

describe('retryDelayMs', () => {
  it('doubles from the base delay per failed attempt', () => {
    expect([1, 2, 3, 4].map((n) => retryDelayMs(n, 5000))).toEqual([5000, 10_000, 20_000, 40_000]);
  });

  it('never waits more than ten minutes, so a long outage is retried until it ends', () => {
    expect(retryDelayMs(50, 5000)).toBe(600_000);
  });
});
