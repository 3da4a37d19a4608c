/**
 * Bounded, safe file reading for the CLI: `--in key=@file`, `calc --record file`. Only regular
 * files are read (devices such as /dev/zero, directories and FIFOs are refused before they are
 * opened), at most `limit + 1` bytes are ever read into memory, a UTF-8 byte-order mark is
 * dropped (as the browser's File.text() does), and no message quotes the file's contents.
 */
import { createHash } from 'node:crypto';
import { closeSync, constants, fstatSync, openSync, readSync, statSync } from 'node:fs';

export class FileReadError extends Error {
  override name = 'FileReadError';
}

export interface FileText {
  /** The text, UTF-8 decoded, without a leading byte-order mark. */
  readonly text: string;
  /** Bytes read (the whole file). */
  readonly bytes: number;
  /** SHA-256 of the file's bytes, first 12 hex digits (compare with `sha256sum`). */
  readonly sha256: string;
}

function kindOf(s: import('node:fs').Stats): string {
  if (s.isDirectory()) return 'a directory';
  if (s.isFIFO()) return 'a pipe (FIFO)';
  if (s.isCharacterDevice() || s.isBlockDevice()) return 'a device';
  if (s.isSocket()) return 'a socket';
  return 'not a regular file';
}

/**
 * Reads a regular file of at most `limit` bytes. Throws FileReadError with a one-line reason
 * (never the contents): missing, unreadable, not a regular file, or larger than the limit.
 */
export function readBoundedFile(path: string, limit: number): FileText {
  let st;
  try { st = statSync(path); } catch (e) { throw new FileReadError(`cannot read file ${path}: ${reason(e)}`); }
  if (!st.isFile()) throw new FileReadError(`cannot read ${path}: ${kindOf(st)}, not a regular file`);
  let fd: number;
  // O_NONBLOCK: a path swapped for a FIFO after the check cannot block the open
  try { fd = openSync(path, constants.O_RDONLY | (constants.O_NONBLOCK ?? 0)); } catch (e) { throw new FileReadError(`cannot read file ${path}: ${reason(e)}`); }
  try {
    if (!fstatSync(fd).isFile()) throw new FileReadError(`cannot read ${path}: not a regular file`);
    const buf = Buffer.alloc(Math.min(limit + 1, Math.max(st.size, 0) + 1, limit + 1));
    let n = 0;
    let grow = buf;
    for (;;) {
      if (n === grow.length) {
        if (grow.length > limit) break;
        const bigger = Buffer.alloc(Math.min(grow.length * 2, limit + 1));
        grow.copy(bigger, 0, 0, n);
        grow = bigger;
      }
      const r = readSync(fd, grow, n, grow.length - n, null);
      if (r === 0) break;
      n += r;
    }
    if (n > limit) throw new FileReadError(`${path} is larger than ${limit} bytes`);
    const data = grow.subarray(0, n);
    const sha256 = createHash('sha256').update(data).digest('hex').slice(0, 12);
    return { text: data.toString('utf8').replace(/^\uFEFF/, ''), bytes: n, sha256 };
  } finally {
    closeSync(fd);
  }
}

function reason(e: unknown): string {
  const code = (e as { code?: string }).code;
  return code === 'ENOENT' ? 'no such file' : code === 'EACCES' || code === 'EPERM' ? 'permission denied' : code === 'ELOOP' ? 'symbolic link loop' : (code ?? 'unreadable');
}
