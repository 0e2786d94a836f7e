/**
 * Objects as plain files under one directory: <dir>/<key> holds the bytes, <dir>/<key>.meta.json the
 * content type and SHA-256. Neither name can be a key (keys have no "."), nor can the temporary
 * files (".<name>.<random>.tmp").
 *
 * Writes are atomic and durable: each file is written to a temporary file in the same directory,
 * fsynced, renamed over its final name, and the directory is fsynced, so an acknowledged put survives
 * a crash and a reader never sees half a file. The metadata is renamed into place before the bytes,
 * and delete removes the bytes first, so "the bytes exist" implies "the metadata exists". (Replacing an
 * existing key is not atomic across the two files; attachment keys are random and never reused.)
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type { ObjectMeta, ObjectStore, StoredObject } from './index';
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
    const file = this.file(key);
    if (!Buffer.isBuffer(body)) throw new TypeError('put() takes the body as a Buffer');
    if (!meta.contentType) throw new TypeError('put() needs a contentType');
    if (!SHA256_HEX.test(meta.sha256)) throw new TypeError('put() needs the SHA-256 as 64 lowercase hex digits');
    const dir = path.dirname(file);
    await fs.promises.mkdir(dir, { recursive: true });
    if ((await fs.promises.lstat(file).catch(() => null))?.isDirectory()) {
      throw new Error(`cannot store "${key}": the key is a prefix of other keys (a directory)`);
    }
    const metaJson = JSON.stringify({ contentType: meta.contentType, sha256: meta.sha256, size: body.length });
    const metaTmp = await writeTemp(file + '.meta.json', Buffer.from(metaJson + '\n'));
    let bodyTmp: string | null = null;
    let metaPlaced = false;
    try {
      bodyTmp = await writeTemp(file, body);
      await fs.promises.rename(metaTmp, file + '.meta.json');
      metaPlaced = true;
      await fs.promises.rename(bodyTmp, file);
      bodyTmp = null;
      await fsyncDir(dir);
    } catch (err) {
      await fs.promises.rm(metaTmp, { force: true });
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

/** Writes bytes to a new temporary file beside `target`, fsynced; returns its path. */
async function writeTemp(target: string, bytes: Buffer): Promise<string> {
  const tmp = path.join(path.dirname(target), `.${path.basename(target)}.${crypto.randomBytes(6).toString('hex')}.tmp`);
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
