/**
 * Objects as plain files under one directory: <dir>/<key> holds the bytes, <dir>/<key>.meta.json the
 * content type and SHA-256. Neither name can be a key (keys have no "."), nor can the temporary
 * files (".<name>.<random>.tmp").
 *
 * Writes are atomic and durable: each file is written to a temporary file in the same directory,
 * fsynced, renamed over its final name, and the directory is fsynced (and so are the parents of any
 * directory a put creates), so an acknowledged put survives a crash and a reader never sees half a
 * file. putFile copies an upload's temporary file in the same way, hashing the bytes it copies: a
 * copy whose SHA-256 differs from the one given is never placed. The metadata is renamed into place before the bytes,
 * and delete removes the bytes first, so "the bytes exist" implies "the metadata exists". (Replacing an
 * existing key is not atomic across the two files; attachment keys are random and never reused.)
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { ObjectMeta, ObjectStore, StoredObject } from './types';
import { assertKey, ObjectNotFoundError, SHA256_HEX } from './keys';

const isCode = (err: unknown, ...codes: string[]) => codes.includes((err as NodeJS.ErrnoException)?.code ?? '');

export class LocalStore implements ObjectStore {
  readonly kind = 'local' as const;
  readonly dir: string;

  constructor(dir: string) {
    if (!path.isAbsolute(dir)) throw new Error(`LocalStore needs an absolute directory, got "${dir}"`);
    this.dir = path.resolve(dir);
  }

  /** The file of a key, checked to stay inside the store's directory (beside assertKey). */
  private file(key: string): string {
    assertKey(key);
    const file = path.resolve(this.dir, key);
    if (!file.startsWith(this.dir + path.sep)) throw new Error(`key "${key}" resolves outside the store`);
    return file;
  }

  async put(key: string, body: Buffer, meta: ObjectMeta): Promise<void> {
    if (!Buffer.isBuffer(body)) throw new TypeError('put() takes the body as a Buffer');
    checkMeta(meta);
    await this.place(key, meta, async (file) => ({ tmp: await writeTemp(file, body), size: body.length }));
  }

  async putFile(key: string, source: string, meta: ObjectMeta): Promise<void> {
    if (typeof source !== 'string' || !path.isAbsolute(source)) throw new TypeError('putFile() takes the absolute path of a file');
    checkMeta(meta);
    await this.place(key, meta, (file) => copyTemp(file, source, meta.sha256, key));
  }

  /** Writes the bytes (writeBody) and the metadata to temporary files beside the key's file, then renames them into place. */
  private async place(key: string, meta: ObjectMeta, writeBody: (file: string) => Promise<{ tmp: string; size: number }>): Promise<void> {
    const file = this.file(key);
    const dir = path.dirname(file);
    await mkdirDurable(dir);
    if ((await fs.promises.lstat(file).catch(() => null))?.isDirectory()) {
      throw new Error(`cannot store "${key}": the key is a prefix of other keys (a directory)`);
    }
    const body = await writeBody(file);
    let bodyTmp: string | null = body.tmp;
    let metaTmp: string | null = null;
    let metaPlaced = false;
    try {
      const metaJson = JSON.stringify({ contentType: meta.contentType, sha256: meta.sha256, size: body.size });
      metaTmp = await writeTemp(file + '.meta.json', Buffer.from(metaJson + '\n'));
      await fs.promises.rename(metaTmp, file + '.meta.json');
      metaPlaced = true;
      await fs.promises.rename(bodyTmp, file);
      bodyTmp = null;
      await fsyncDir(dir);
    } catch (err) {
      if (metaTmp && !metaPlaced) await fs.promises.rm(metaTmp, { force: true });
      if (bodyTmp) await fs.promises.rm(bodyTmp, { force: true });
      // Metadata without bytes describes nothing: take it back unless older bytes are still there.
      if (metaPlaced && !(await this.exists(key).catch(() => true))) await fs.promises.rm(file + '.meta.json', { force: true });
      throw err;
    }
  }

  async get(key: string): Promise<StoredObject> {
    const file = this.file(key);
    let handle: fs.promises.FileHandle;
    try {
      handle = await fs.promises.open(file, 'r');
    } catch (err) {
      if (isCode(err, 'ENOENT', 'ENOTDIR', 'EISDIR')) throw new ObjectNotFoundError(key);
      throw err;
    }
    try {
      const stat = await handle.stat();
      if (!stat.isFile()) throw new ObjectNotFoundError(key);
      let meta: ObjectMeta;
      try {
        meta = JSON.parse(await fs.promises.readFile(file + '.meta.json', 'utf8')) as ObjectMeta;
      } catch (err) {
        // Only a delete running between the open and here removes the metadata of existing bytes.
        if (isCode(err, 'ENOENT')) throw new ObjectNotFoundError(key);
        throw err;
      }
      // The open handle keeps the bytes readable even if the key is deleted meanwhile.
      const body = handle.createReadStream({ autoClose: true });
      return { body, size: stat.size, contentType: meta.contentType, sha256: meta.sha256 };
    } catch (err) {
      await handle.close();
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    const file = this.file(key);
    await rmIfThere(file);
    await rmIfThere(file + '.meta.json');
  }

  async exists(key: string): Promise<boolean> {
    const file = this.file(key);
    try {
      return (await fs.promises.stat(file)).isFile();
    } catch (err) {
      if (isCode(err, 'ENOENT', 'ENOTDIR')) return false;
      throw err;
    }
  }
}

function checkMeta(meta: ObjectMeta): void {
  if (!meta.contentType) throw new TypeError('put() needs a contentType');
  if (!SHA256_HEX.test(meta.sha256)) throw new TypeError('put() needs the SHA-256 as 64 lowercase hex digits');
}

const tempName = (target: string) => path.join(path.dirname(target), `.${path.basename(target)}.${crypto.randomBytes(6).toString('hex')}.tmp`);

/**
 * Copies a file to a new temporary file beside `target`, hashing what it copies, fsynced; returns its
 * path and size. Refuses (removing the copy) when the SHA-256 of the bytes is not `sha256`.
 */
async function copyTemp(target: string, source: string, sha256: string, key: string): Promise<{ tmp: string; size: number }> {
  const tmp = tempName(target);
  const hash = crypto.createHash('sha256');
  let size = 0;
  try {
    const out = fs.createWriteStream(tmp, { flags: 'wx', mode: 0o640 });
    await pipeline(fs.createReadStream(source), async function* (chunks: AsyncIterable<Buffer>) {
      for await (const chunk of chunks) {
        hash.update(chunk);
        size += chunk.length;
        yield chunk;
      }
    }, out);
    const got = hash.digest('hex');
    if (got !== sha256) throw new Error(`cannot store "${key}": the bytes copied have SHA-256 ${got}, not ${sha256}`);
    const handle = await fs.promises.open(tmp, 'r+');
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
  } catch (err) {
    await fs.promises.rm(tmp, { force: true });
    throw err;
  }
  return { tmp, size };
}

/** Makes a directory and its missing parents, fsyncing the parent of each one made so that the new entries are durable. */
async function mkdirDurable(dir: string): Promise<void> {
  const first = await fs.promises.mkdir(dir, { recursive: true });
  if (!first) return;
  for (let d = dir; ; d = path.dirname(d)) {
    await fsyncDir(path.dirname(d));
    if (d === path.resolve(first) || path.dirname(d) === d) break;
  }
}

/** Writes bytes to a new temporary file beside `target`, fsynced; returns its path. */
async function writeTemp(target: string, bytes: Buffer): Promise<string> {
  const tmp = tempName(target);
  const handle = await fs.promises.open(tmp, 'wx', 0o640);
  try {
    await handle.writeFile(bytes);
    await handle.sync();
  } catch (err) {
    await handle.close().catch(() => {});
    await fs.promises.rm(tmp, { force: true });
    throw err;
  }
  await handle.close();
  return tmp;
}

/** fsync a directory so that a rename in it is durable (Linux; a no-op where directories cannot be opened). */
async function fsyncDir(dir: string): Promise<void> {
  let handle: fs.promises.FileHandle | undefined;
  try {
    handle = await fs.promises.open(dir, 'r');
    await handle.sync();
  } catch (err) {
    if (!isCode(err, 'EISDIR', 'EPERM', 'EINVAL', 'EBADF')) throw err;
  } finally {
    await handle?.close();
  }
}

async function rmIfThere(file: string): Promise<void> {
  try {
    await fs.promises.unlink(file);
  } catch (err) {
    if (!isCode(err, 'ENOENT', 'ENOTDIR')) throw err;
  }
}
