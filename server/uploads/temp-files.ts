/**
 * Where uploaded files wait while a request is handled (issue 13): a multer storage engine that
 * streams each file into a temporary file and hashes it (SHA-256) as the bytes arrive, so that a
 * request's files are never held in memory.
 *
 *   UPLOAD_TMP_DIR   the directory of these temporary files (default: the system's, os.tmpdir());
 *                    keep it on local disk, one per machine
 *
 * Temporary files are named cw-upload-<pid>-<random>.part, readable by their owner only. Multer
 * removes them when it refuses a request (size, count, malformed body, the client going away);
 * discardUploads() removes them once the route is done with them; sweepStaleTempFiles() removes those
 * of an app process that no longer runs (killed before it could clean up).
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pipeline, Transform, type TransformCallback } from 'node:stream';
import type { Request } from 'express';
import type { StorageEngine } from 'multer';

/** What the engine adds to each multer file. */
export interface TempFileInfo {
  /** The temporary file holding the bytes. */
  path: string;
  size: number;
  /** Of the bytes as received, 64 lowercase hex digits. */
  sha256: string;
}

export type UploadedTempFile = Express.Multer.File & { sha256?: string };

const NAME = /^cw-upload-(\d+)-[0-9a-f]{16}\.part$/;

/** UPLOAD_TMP_DIR (absolute, or relative to the working directory), or the system's temporary directory. */
export function uploadTempDir(env: Record<string, string | undefined> = process.env): string {
  const configured = env.UPLOAD_TMP_DIR?.trim();
  return configured ? path.resolve(configured) : os.tmpdir();
}

const ignoreMissing = (err: unknown) => {
  if ((err as NodeJS.ErrnoException)?.code !== 'ENOENT') throw err;
};

/** Removes a temporary file; one already gone is not an error. */
export async function removeTempFile(file: string): Promise<void> {
  await fs.promises.unlink(file).catch(ignoreMissing);
}

/** Counts and hashes the bytes that pass through. */
class Hasher extends Transform {
  readonly hash = crypto.createHash('sha256');
  bytes = 0;
  _transform(chunk: Buffer, _enc: BufferEncoding, cb: TransformCallback): void {
    this.hash.update(chunk);
    this.bytes += chunk.length;
    cb(null, chunk);
  }
}

export class HashingTempStorage implements StorageEngine {
  readonly dir: string;
  private dirReady: Promise<void> | null = null;

  constructor(dir: string = uploadTempDir()) {
    this.dir = path.resolve(dir);
  }

  private ensureDir(): Promise<void> {
    this.dirReady ??= fs.promises.mkdir(this.dir, { recursive: true, mode: 0o700 }).then(
      () => undefined,
      (err) => {
        this.dirReady = null;
        throw err;
      },
    );
    return this.dirReady;
  }

  _handleFile(_req: Request, file: Express.Multer.File, cb: (error?: unknown, info?: Partial<Express.Multer.File>) => void): void {
    const tmp = path.join(this.dir, `cw-upload-${process.pid}-${crypto.randomBytes(8).toString('hex')}.part`);
    this.ensureDir().then(
      () => {
        if (file.stream.destroyed) return cb(new Error('Request aborted'));
        const hasher = new Hasher();
        const out = fs.createWriteStream(tmp, { flags: 'wx', mode: 0o600 });
        pipeline(file.stream, hasher, out, (err) => {
          if (err) {
            // Nothing of a failed file is handed to multer, so the engine removes it itself.
            void removeTempFile(tmp).then(
              () => cb(err),
              () => cb(err),
            );
            return;
          }
          const info: TempFileInfo = { path: tmp, size: hasher.bytes, sha256: hasher.hash.digest('hex') };
          cb(null, info as Partial<Express.Multer.File>);
        });
      },
      (err) => {
        file.stream.resume();
        cb(err);
      },
    );
  }

  _removeFile(_req: Request, file: Express.Multer.File, cb: (error: Error | null) => void): void {
    if (!file.path) return cb(null);
    removeTempFile(file.path).then(
      () => cb(null),
      (err) => cb(err as Error),
    );
  }
}

/**
 * Removes the temporary files of app processes that are gone (a kill -9 or a crash leaves its
 * uploads in flight behind). Files of live processes are kept; never throws.
 */
export async function sweepStaleTempFiles(dir: string): Promise<string[]> {
  let names: string[];
  try {
    names = await fs.promises.readdir(dir);
  } catch {
    return [];
  }
  const removed: string[] = [];
  for (const name of names) {
    const m = NAME.exec(name);
    if (!m) continue;
    const pid = Number(m[1]);
    if (pid === process.pid || isAlive(pid)) continue;
    try {
      await removeTempFile(path.join(dir, name));
      removed.push(name);
    } catch {
      /* not ours to remove (another user's file): leave it */
    }
  }
  return removed;
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    // EPERM: a process of another user holds that pid; it is alive.
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}
