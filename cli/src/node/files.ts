/** Writing results: whole or not at all (a temporary file renamed into place). */
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';

/** Writes text to a file atomically: an interrupted run never leaves half a report behind. */
export async function writeFileAtomic(cwd: string, path: string, text: string): Promise<string> {
  const target = resolve(cwd, path);
  await mkdir(dirname(target), { recursive: true });
  const temp = `${target}.${process.pid}.${Date.now()}.tmp`;
  try {
    await writeFile(temp, text, 'utf8');
    await rename(temp, target);
  } catch (err) {
    await rm(temp, { force: true });
    throw err;
  }
  return target;
}
