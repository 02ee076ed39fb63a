import { WriteQueue } from './write-queue.js';

describe('WriteQueue', () => {
  it('runs jobs one at a time in arrival order, even when they are started together', async () => {
    const queue = new WriteQueue();
    const log: string[] = [];
    let running = 0;
    let most = 0;
    const job = (name: string) => async () => {
      running += 1;
      most = Math.max(most, running);
      log.push(`start ${name}`);
      await new Promise((resolve) => setImmediate(resolve));
      log.push(`end ${name}`);
      running -= 1;
      return name;
    };
    const results = await Promise.all(['a', 'b', 'c'].map((n) => queue.run(job(n))));
    expect(results).toEqual(['a', 'b', 'c']);
    expect(most).toBe(1);
    expect(log).toEqual(['start a', 'end a', 'start b', 'end b', 'start c', 'end c']);
    expect(queue.depth).toBe(0);
  });

  it('a failed job rejects its own caller only; the next job still runs', async () => {
    const queue = new WriteQueue();
    const failed = queue.run(() => Promise.reject(new Error('disk full')));
    const next = queue.run(() => Promise.resolve('next'));
    await expect(failed).rejects.toThrow('disk full');
    await expect(next).resolves.toBe('next');
  });

  it('a job started inside a job runs at once instead of waiting behind itself', async () => {
    const queue = new WriteQueue();
    const outer = queue.run(async () => `outer(${await queue.run(() => Promise.resolve('inner'))})`);
    await expect(outer).resolves.toBe('outer(inner)');
  });

  it('drained() waits for every job queued so far', async () => {
    const queue = new WriteQueue();
    let done = 0;
    for (let i = 0; i < 3; i++)
      void queue.run(async () => {
        await new Promise((resolve) => setImmediate(resolve));
        done += 1;
      });
    await queue.drained();
    expect(done).toBe(3);
  });
});
