/** What backup and restore run: the MariaDB client tools, GNU tar, checksums and a dump filter. */
import { spawn } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { Transform, type TransformCallback } from 'node:stream';
import type { Config } from '../config';


/** A client option file (mode 600) so that the password never appears on a command line. */
export function clientOptionFile(db: Config['db']): { file: string; remove: () => void } {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-client-'));
  const file = path.join(dir, 'client.cnf');
  const quote = (s: string) => `"${s.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
  fs.writeFileSync(
    file,
    ['[client]', `host=${db.host}`, `port=${db.port}`, `user=${quote(db.user)}`, `password=${quote(db.password)}`, 'protocol=tcp', ''].join('\n'),
    { mode: 0o600 },
  );
  return { file, remove: () => fs.rmSync(dir, { recursive: true, force: true }) };
}

export interface Ran {
  code: number | null;
  stderr: string;
}

/** Runs a program with stdin/stdout wired by the caller; a missing program gets a message saying what to install. */
export function run(
  cmd: string,
  args: string[],
  io: { stdin?: NodeJS.ReadableStream; stdout?: (out: NodeJS.ReadableStream) => Promise<void> } = {},
  installHint = '',
): Promise<Ran> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: [io.stdin ? 'pipe' : 'ignore', io.stdout ? 'pipe' : 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr!.setEncoding('utf8');
    child.stderr!.on('data', (d: string) => {
      if (stderr.length < 20_000) stderr += d;
    });
    const piping: Promise<unknown>[] = [];
    if (io.stdin) piping.push(pipeline(io.stdin, child.stdin!));
    if (io.stdout) piping.push(io.stdout(child.stdout!));
    let failed: Error | null = null;
    child.once('error', (err: NodeJS.ErrnoException) => {
      failed = err.code === 'ENOENT' ? new Error(`${cmd} was not found on PATH.${installHint ? ' ' + installHint : ''}`) : err;
    });
    child.once('close', (code) => {
      Promise.allSettled(piping).then((results) => {
        if (failed) return reject(failed);
        const broken = results.find((r): r is PromiseRejectedResult => r.status === 'rejected');
        // A client that exits early breaks our pipe: its own message (stderr) says why.
        if (broken && code === 0) return reject(broken.reason);
        resolve({ code, stderr: stderr.trim() });
      });
    });
  });
}

export const CLIENT_HINT = 'Install the MariaDB client tools (on Debian: `sudo apt-get install -y mariadb-client`).';
export const TAR_HINT = 'Install GNU tar and gzip (on Debian: `sudo apt-get install -y tar gzip`).';

export async function toolVersion(cmd: string): Promise<string> {
  let out = '';
  const r = await run(cmd, ['--version'], {
    stdout: async (s) => {
      for await (const chunk of s) out += chunk.toString();
    },
  }, CLIENT_HINT);
  if (r.code !== 0) throw new Error(`${cmd} --version failed: ${r.stderr}`);
  return out.trim();
}

/**
 * Leaves out the DEFINER of triggers (and views, routines, events) in mariadb-dump's output: loading
 * a definer other than oneself needs the SUPER or SET USER privilege, which the app user has not.
 * Only the dump's own definition lines (`/*!50003 CREATE*\/ …`, `/*!50001 CREATE …`) are touched,
 * never a row of data.
 */
export class StripDefiners extends Transform {
  /** Bytes after the last newline so far (a newline byte never occurs inside a UTF-8 sequence). */
  private rest: Buffer = Buffer.alloc(0);
  _transform(chunk: Buffer, _enc: BufferEncoding, done: TransformCallback): void {
    const bytes = this.rest.length ? Buffer.concat([this.rest, chunk]) : chunk;
    const cut = bytes.lastIndexOf(0x0a);
    if (cut < 0) {
      this.rest = bytes;
      return done();
    }
    this.rest = bytes.subarray(cut + 1);
    done(null, StripDefiners.lines(bytes.subarray(0, cut + 1)));
  }
  _flush(done: TransformCallback): void {
    done(null, StripDefiners.lines(this.rest));
  }
  private static readonly DEFINITION = Buffer.from('/*!5000');
  /** Lines of bytes; only definition lines are decoded and changed, every other byte passes as it is. */
  static lines(bytes: Buffer): Buffer {
    const out: Buffer[] = [];
    let start = 0;
    while (start < bytes.length) {
      const nl = bytes.indexOf(0x0a, start);
      const end = nl < 0 ? bytes.length : nl + 1;
      const line = bytes.subarray(start, end);
      out.push(line.subarray(0, StripDefiners.DEFINITION.length).equals(StripDefiners.DEFINITION) ? Buffer.from(StripDefiners.strip(line.toString('utf8')), 'utf8') : line);
      start = end;
    }
    return Buffer.concat(out);
  }
  static strip(line: string): string {
    if (!/^\/\*!5000[0-9] (CREATE|ALTER)\b/.test(line)) return line;
    return line
      .replace(/\/\*!50017 DEFINER=`(?:[^`]|``)*`@`(?:[^`]|``)*`\s*\*\/\s?/g, '')
      .replace(/\/\*!50013 DEFINER=`(?:[^`]|``)*`@`(?:[^`]|``)*` SQL SECURITY (DEFINER|INVOKER) \*\/\s?/g, '');
  }
}

export async function sha256File(file: string): Promise<{ sha256: string; size: number }> {
  const hash = crypto.createHash('sha256');
  let size = 0;
  for await (const chunk of fs.createReadStream(file)) {
    hash.update(chunk as Buffer);
    size += (chunk as Buffer).length;
  }
  return { sha256: hash.digest('hex'), size };
}

export async function tail(file: string, bytes: number): Promise<string> {
  const h = await fs.promises.open(file, 'r');
  try {
    const { size } = await h.stat();
    const buf = Buffer.alloc(Math.min(bytes, size));
    await h.read(buf, 0, buf.length, size - buf.length);
    return buf.toString('utf8');
  } finally {
    await h.close();
  }
}

export async function fsyncPath(p: string): Promise<void> {
  const h = await fs.promises.open(p, 'r');
  try {
    await h.sync();
  } finally {
    await h.close();
  }
}
