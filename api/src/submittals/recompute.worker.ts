import { parentPort } from 'node:worker_threads';
import { checkFiles, type CheckRules } from './check-files.js';

/** A job from RecomputePool: the files' bytes and the rules; answers the CheckOutcome or an error. */
interface Job {
  readonly id: number;
  readonly files: readonly { name: string; content: Uint8Array }[];
  readonly rules: CheckRules;
}

parentPort?.on('message', (job: Job) => {
  try {
    const files = job.files.map((f) => ({
      name: f.name,
      content: Buffer.from(f.content.buffer, f.content.byteOffset, f.content.byteLength),
    }));
    parentPort?.postMessage({ id: job.id, outcome: checkFiles(files, job.rules) });
  } catch (error) {
    parentPort?.postMessage({
      id: job.id,
      error: error instanceof Error ? (error.stack ?? error.message) : String(error),
    });
  }
});
