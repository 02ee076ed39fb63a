/** Writing results: whole or not at all (a temporary file renamed into place). */
import { mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';

/** Writes text to a file atomically: an interrupted run never leaves half a report behind. */
export async function writeFileAtomic(cwd: string, path: string, text: string): Promise<string> {
  const target = resolve(cwd, path);
  try {
    await mkdir(dirname(target), { recursive: true });
  } catch (err) {
    throw new Error(
      `cannot create the folder for ${target}: ${err instanceof Error ? err.message : String(err)}`,
      { cause: err },
    );
  }
  const temp = `${target}.${process.pid}.${Date.now()}.tmp`;
  try {
    await writeFile(temp, text, 'utf8');
    await rename(temp, target);
  } catch (err) {
    await rm(temp, { force: true });
    const code = (err as NodeJS.ErrnoException).code;
    const why =
      code === 'EISDIR'
        ? 'it is a directory'
        : code === 'EACCES' || code === 'EPERM'
          ? 'permission denied'
          : code === 'ENOENT'
            ? 'no such directory'
            : err instanceof Error
              ? err.message
              : String(err);
    throw new Error(`cannot write ${target}: ${why}`, { cause: err });
  }
  return target;
}
