import { Injectable, Logger, OnApplicationShutdown } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { checkFiles, type CheckOutcome, type CheckRules, type IncomingFile } from './check-files.js';

/** The built worker (dist/submittals/recompute.worker.js); it loads `ligament` from cli/dist. */
const WORKER_FILE = fileURLToPath(new URL('./recompute.worker.js', import.meta.url));

interface Pending {
  readonly id: number;
  readonly files: readonly IncomingFile[];
  readonly rules: CheckRules;
  resolve(outcome: CheckOutcome): void;
  reject(error: Error): void;
}

interface Slot {
  readonly worker: Worker;
  job: Pending | null;
}

/**
 * Validation and recomputation of uploaded files off the event loop: a bounded pool of worker threads
 * (one less than the cores, at least one), reused for every job, jobs queued in arrival order. While a
 * large upload is recomputed, health, reads and writes go on.
 *
 * Where the worker is not built (the API's Jest run loads src/*.ts, and a worker cannot run
 * TypeScript) the same checkFiles runs in-process: tests exercise the same code and the same engine.
 */
@Injectable()
export class RecomputePool implements OnApplicationShutdown {
  private readonly logger = new Logger(RecomputePool.name);
  private readonly size = Math.max(1, availableParallelism() - 1);
  private readonly slots: Slot[] = [];
  private readonly queue: Pending[] = [];
  private nextId = 1;
  private closed = false;
  readonly inProcess = !existsSync(WORKER_FILE);

  check(files: readonly IncomingFile[], rules: CheckRules): Promise<CheckOutcome> {
    if (this.inProcess) return Promise.resolve(checkFiles(files, rules));
    return new Promise((resolve, reject) => {
      this.queue.push({ id: this.nextId++, files, rules, resolve, reject });
      this.dispatch();
    });
  }

  async onApplicationShutdown(): Promise<void> {
    this.closed = true;
    await Promise.all(this.slots.map((s) => s.worker.terminate()));
    this.slots.length = 0;
  }

  private dispatch(): void {
    while (this.queue.length > 0 && !this.closed) {
      let slot = this.slots.find((s) => s.job === null);
      if (!slot && this.slots.length < this.size) slot = this.spawn();
      if (!slot) return;
      const job = this.queue.shift() as Pending;
      slot.job = job;
      slot.worker.postMessage({
        id: job.id,
        files: job.files.map((f) => ({ name: f.name, content: f.content })),
        rules: { allowedExtensions: [...job.rules.allowedExtensions] },
      });
    }
  }

  private spawn(): Slot {
    const worker = new Worker(WORKER_FILE);
    worker.unref();
    const slot: Slot = { worker, job: null };
    worker.on('message', (reply: { id: number; outcome?: CheckOutcome; error?: string }) => {
      const job = slot.job;
      slot.job = null;
      if (job && job.id === reply.id) {
        if (reply.outcome) job.resolve(this.withBuffers(reply.outcome, job.files));
        else job.reject(new Error(`recompute failed: ${reply.error ?? 'no outcome'}`));
      }
      this.dispatch();
    });
    const lost = (why: string) => {
      const index = this.slots.indexOf(slot);
      if (index >= 0) this.slots.splice(index, 1);
      if (slot.job) slot.job.reject(new Error(`recompute worker ${why}`));
      slot.job = null;
      if (!this.closed) {
        this.logger.error(`Recompute worker ${why}; a new one takes its place.`);
        this.dispatch();
      }
    };
    worker.on('error', (error) => lost(`failed: ${error.message}`));
    worker.on('exit', (code) => lost(`exited with ${code}`));
    this.slots.push(slot);
    return slot;
  }

  /** Files come back as Uint8Array copies: give them the caller's own Buffers again. */
  private withBuffers(outcome: CheckOutcome, files: readonly IncomingFile[]): CheckOutcome {
    if (!outcome.ok) return outcome;
    const byName = new Map(files.map((f) => [f.name, f.content]));
    return {
      ok: true,
      files: outcome.files.map((f) => ({ ...f, content: byName.get(f.name) ?? Buffer.from(f.content) })),
    };
  }
}
