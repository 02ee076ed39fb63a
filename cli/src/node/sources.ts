/**
 * Turns the PATH… arguments of `validate` and `check` into sources, one file at a time: files,
 * directories (recursively, `*.json`), globs (tinyglobby) and `-` for standard input. Anything that
 * cannot be read becomes a source carrying a CalcError, so the run reports it and goes on.
 */
import { closeSync, constants, fstatSync, openSync, readSync, type Stats } from 'node:fs';
import { lstat, readdir, realpath, stat } from 'node:fs/promises';
import { isAbsolute, join, relative, resolve, sep } from 'node:path';
import { sourceError, type Source } from '../runner/source.js';

/** Calc files larger than this are refused (a 500-hole member is about 60 kB). */
export const MAX_FILE_BYTES = 4 * 1024 * 1024;

export interface SourceOptions {
  readonly cwd: string;
  /** Reads standard input as UTF-8, stopping once more than `maxBytes` bytes have come. */
  readonly readStdin: (maxBytes: number) => Promise<string>;
  readonly maxBytes?: number;
}

const GLOB_CHARS = /[*?[\]{}!]/;

/** A file found by walking a directory (not named on the command line). */
interface Walked {
  readonly walked: string;
}

/**
 * Whether a file found in a directory should be read as a calc file. Files that are not JSON at all
 * are (their syntax error is worth reporting); well-formed JSON that is not an object holding
 * `format` or `members` (package.json, fixtures, expectation files) is skipped.
 */
export function looksLikeCalc(text: string): boolean {
  const start = text.trimStart();
  // The common case, decided without parsing: an object naming the calc file's own keys.
  if (start.startsWith('{') && (text.includes('"format"') || text.includes('"members"'))) return true;
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return true;
  }
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return false;
  return 'format' in value || 'members' in value;
}

/** The name a file is reported under: relative to the working directory with `/` separators. */
export function displayName(absolute: string, cwd: string): string {
  const rel = relative(cwd, absolute);
  const name = rel === '' || isAbsolute(rel) ? absolute : rel;
  return sep === '/' ? name : name.split(sep).join('/');
}

function describeFsError(err: unknown): { rule: string; message: string } {
  const code = (err as NodeJS.ErrnoException | undefined)?.code;
  if (code === 'ELOOP')
    return { rule: 'symlink-loop', message: 'symbolic links form a loop; nothing to read' };
  if (code === 'ENOENT') return { rule: 'not-found', message: 'no such file or directory' };
  if (code === 'EACCES' || code === 'EPERM') return { rule: 'read-error', message: 'permission denied' };
  if (code === 'EISDIR') return { rule: 'read-error', message: 'is a directory' };
  return { rule: 'read-error', message: err instanceof Error ? err.message : String(err) };
}

function formatBytes(n: number): string {
  return n >= 1024 * 1024 ? `${(n / (1024 * 1024)).toFixed(1)} MB` : `${Math.ceil(n / 1024)} kB`;
}

/** What a path is when it is not a regular file or a directory, for the error that refuses it. */
function specialKind(info: Stats): string {
  if (info.isFIFO()) return 'a named pipe (FIFO)';
  if (info.isCharacterDevice()) return 'a character device';
  if (info.isBlockDevice()) return 'a block device';
  if (info.isSocket()) return 'a socket';
  return 'not a regular file';
}

/** The error for a path that is neither a regular file nor a directory (it could block or never end). */
function notAFile(name: string, info: Stats): Source {
  return sourceError(
    name,
    'not-a-file',
    `is ${specialKind(info)}, not a regular file; only regular files are read (pipe data into standard input with -)`,
  );
}

/**
 * Reads at most `maxBytes + 1` bytes of an open file: the size `fstat` reports is only a hint (a
 * file may grow while it is read), so the cap is kept while reading.
 */
function readCapped(fd: number, maxBytes: number): { bytes: Buffer; over: boolean } {
  const buffer = Buffer.allocUnsafe(Math.min(maxBytes + 1, 64 * 1024));
  const chunks: Buffer[] = [];
  let total = 0;
  for (;;) {
    const read = readSync(fd, buffer, 0, Math.min(buffer.length, maxBytes + 1 - total), null);
    if (read === 0) break;
    chunks.push(Buffer.from(buffer.subarray(0, read)));
    total += read;
    if (total > maxBytes) return { bytes: Buffer.concat(chunks), over: true };
  }
  return { bytes: Buffer.concat(chunks), over: false };
}

/**
 * Reads one file, refusing files over the size limit before reading them and anything that is not
 * a regular file (a FIFO would block, /dev/zero never ends). The file is opened non-blocking, so
 * opening a FIFO with no writer returns at once; the check is made on the open descriptor, so a
 * path swapped between a check and the open cannot slip through. Synchronous on purpose: files are
 * read one after another anyway, and a thread-pool round trip per open, stat, read and close left a
 * 1,000-file run idle for a third of its time.
 */
export async function readSource(absolute: string, name: string, maxBytes = MAX_FILE_BYTES): Promise<Source> {
  let fd: number | undefined;
  try {
    fd = openSync(absolute, constants.O_RDONLY | constants.O_NONBLOCK);
    const info = fstatSync(fd);
    if (info.isDirectory()) return sourceError(name, 'read-error', 'is a directory');
    if (!info.isFile()) return notAFile(name, info);
    if (info.size > maxBytes) return tooLarge(name, `the file is ${formatBytes(info.size)}`, maxBytes);
    const { bytes, over } = readCapped(fd, maxBytes);
    if (over)
      return tooLarge(name, `the file grew past ${formatBytes(maxBytes)} while it was read`, maxBytes);
    return { file: name, text: bytes.toString('utf8') };
  } catch (err) {
    const { rule, message } = describeFsError(err);
    return sourceError(name, rule, message);
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

function tooLarge(name: string, what: string, maxBytes: number): Source {
  return sourceError(name, 'file-too-large', `${what}; calc files over ${formatBytes(maxBytes)} are refused`);
}

/**
 * Lists the `*.json` files under a directory, depth first in name order. A directory reached again
 * through a symbolic link (a loop) is reported once as a `symlink-loop` source instead of followed.
 */
async function* walk(
  dir: string,
  cwd: string,
  ancestors: ReadonlySet<string>,
): AsyncGenerator<Walked | Source> {
  let real: string;
  try {
    real = await realpath(dir);
  } catch (err) {
    const { rule, message } = describeFsError(err);
    yield sourceError(displayName(dir, cwd), rule, message);
    return;
  }
  if (ancestors.has(real)) {
    yield sourceError(
      displayName(dir, cwd),
      'symlink-loop',
      `symbolic link leads back to ${displayName(real, cwd) || '.'}; not followed`,
    );
    return;
  }
  const inside = new Set(ancestors).add(real);
  let entries;
  try {
    entries = await readdir(dir, { withFileTypes: true });
  } catch (err) {
    const { rule, message } = describeFsError(err);
    yield sourceError(displayName(dir, cwd), rule, message);
    return;
  }
  entries.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
  for (const entry of entries) {
    if (entry.name === 'node_modules' || entry.name.startsWith('.')) continue;
    const path = join(dir, entry.name);
    let isDir = entry.isDirectory();
    let isFile = entry.isFile();
    if (entry.isSymbolicLink()) {
      try {
        const target = await stat(path);
        isDir = target.isDirectory();
        isFile = target.isFile();
      } catch (err) {
        if (!entry.name.endsWith('.json')) continue;
        const { rule, message } = describeFsError(err);
        yield sourceError(displayName(path, cwd), rule, message);
        continue;
      }
    }
    if (isDir) yield* walk(path, cwd, inside);
    else if (isFile && entry.name.endsWith('.json')) yield { walked: path };
    else if (entry.name.endsWith('.json')) {
      // A FIFO or device named like a calc file: reported, never opened.
      try {
        yield notAFile(displayName(path, cwd), await stat(path));
      } catch (err) {
        const { rule, message } = describeFsError(err);
        yield sourceError(displayName(path, cwd), rule, message);
      }
    }
  }
}

async function* expandOne(arg: string, options: SourceOptions): AsyncGenerator<string | Walked | Source> {
  const absolute = resolve(options.cwd, arg);
  let info;
  try {
    info = await lstat(absolute);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT' && GLOB_CHARS.test(arg)) {
      const { glob } = await import('tinyglobby');
      const matches = await glob(arg, { cwd: options.cwd, absolute: true, onlyFiles: true, dot: false });
      if (matches.length === 0) {
        yield sourceError(arg, 'not-found', 'the pattern matches no files');
        return;
      }
      matches.sort();
      for (const m of matches) yield m;
      return;
    }
    const { rule, message } = describeFsError(err);
    yield sourceError(displayName(absolute, options.cwd), rule, message);
    return;
  }
  if (info.isSymbolicLink()) {
    try {
      info = await stat(absolute);
    } catch (err) {
      const { rule, message } = describeFsError(err);
      yield sourceError(displayName(absolute, options.cwd), rule, message);
      return;
    }
  }
  if (info.isDirectory()) yield* walk(absolute, options.cwd, new Set());
  else yield absolute;
}

/**
 * Yields one source per input file, reading each only when the previous one has been consumed, so
 * a run over thousands of files holds one text at a time. A file named twice is read once.
 */
export async function* readSources(args: readonly string[], options: SourceOptions): AsyncGenerator<Source> {
  const seen = new Set<string>();
  for (const arg of args) {
    if (arg === '-') {
      if (seen.has('-')) continue;
      seen.add('-');
      const limit = options.maxBytes ?? MAX_FILE_BYTES;
      const text = await options.readStdin(limit);
      // readStdin stops after limit + 1 bytes, so an endless input (< /dev/zero) ends here too.
      yield Buffer.byteLength(text, 'utf8') > limit
        ? tooLarge('<stdin>', `standard input holds more than ${formatBytes(limit)}`, limit)
        : { file: '<stdin>', text };
      continue;
    }
    for await (const item of expandOne(arg, options)) {
      if (typeof item !== 'string' && !('walked' in item)) {
        yield item;
        continue;
      }
      const path = typeof item === 'string' ? item : item.walked;
      if (seen.has(path)) continue;
      seen.add(path);
      const source = await readSource(path, displayName(path, options.cwd), options.maxBytes);
      if (
        typeof item !== 'string' &&
        'text' in source &&
        source.text.trim() !== '' &&
        !looksLikeCalc(source.text)
      )
        continue;
      yield source;
    }
  }
}

/**
 * Reads a readable stream (standard input) as UTF-8 text, up to `maxBytes + 1` bytes: past the cap
 * the stream is let go and the caller refuses the text on its size, so an endless input never
 * fills the memory.
 */
export async function readStream(stream: NodeJS.ReadableStream, maxBytes = MAX_FILE_BYTES): Promise<string> {
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of stream) {
    const bytes = typeof chunk === 'string' ? Buffer.from(chunk) : chunk;
    chunks.push(bytes);
    total += bytes.length;
    if (total > maxBytes) break;
  }
  return Buffer.concat(chunks)
    .subarray(0, maxBytes + 1)
    .toString('utf8');
}
