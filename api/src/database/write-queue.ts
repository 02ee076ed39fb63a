import { AsyncLocalStorage } from 'node:async_hooks';

/**
 * Runs jobs one at a time, in arrival order. Every write of the service goes through one of these in
 * front of the single write connection, so two writers never wait on SQLite's lock (where a waiting
 * writer holds a libuv thread for the whole busy timeout). A job that starts another job (a
 * transaction inside a write already queued) runs it at once instead of waiting behind itself.
 */
export class WriteQueue {
  private tail: Promise<unknown> = Promise.resolve();
  private readonly inside = new AsyncLocalStorage<true>();
  private queued = 0;

  /** True inside a running job (and whatever it awaits). */
  get insideJob(): boolean {
    return this.inside.getStore() === true;
  }

  /** Jobs waiting or running. */
  get depth(): number {
    return this.queued;
  }

  run<T>(job: () => Promise<T>): Promise<T> {
    if (this.inside.getStore()) return job();
    this.queued += 1;
    const result = this.tail.then(() => this.inside.run(true, job));
    this.tail = result
      .catch(() => undefined)
      .finally(() => {
        this.queued -= 1;
      });
    return result;
  }

  /** Resolves once every job queued so far has ended. */
  async drained(): Promise<void> {
    while (this.queued > 0) await this.tail;
  }
}
