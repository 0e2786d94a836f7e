/**
 * Where attachment bytes live: a directory on this machine (STORAGE=local, the default) or an S3
 * bucket (STORAGE=s3). The database keeps the key, name, media type, size and SHA-256 of each object;
 * the store keeps the bytes. Keys come from newAttachmentKey() and are checked by every store.
 *
 * Variables (all optional with STORAGE=local):
 *   STORAGE               local | s3                                   (default local)
 *   UPLOAD_DIR            local: the directory, relative to the project root (default .data/uploads)
 *   S3_BUCKET             s3: the bucket (required)
 *   S3_REGION             s3: default us-east-1
 *   S3_ENDPOINT           s3: http(s) URL of an S3-compatible service (default: AWS for the region)
 *   S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY
 *                         s3: both or neither; neither = the AWS SDK's default credential chain
 *   S3_FORCE_PATH_STYLE   s3: true | false (default true when S3_ENDPOINT is set, else false)
 */
import path from 'node:path';
import { ROOT } from '../config';
import { LocalStore } from './local';
import { S3Store } from './s3';

export { assertKey, InvalidKeyError, newAttachmentKey, ObjectNotFoundError } from './keys';
export { LocalStore } from './local';
export { S3Store } from './s3';

export type { LocalStorageConfig, ObjectMeta, ObjectStore, S3StorageConfig, StoredObject } from './types';
import type { LocalStorageConfig, S3StorageConfig } from './types';

export type StorageConfig = LocalStorageConfig | S3StorageConfig;

/** A storage variable with a wrong or missing value; the message names the variable. */
export class StorageConfigError extends Error {
  constructor(readonly variable: string, message: string) {
    super(message);
    this.name = 'StorageConfigError';
  }
}

type Env = Record<string, string | undefined>;

const value = (env: Env, name: string): string | undefined => {
  const raw = env[name]?.trim();
  return raw ? raw : undefined;
};

/** Bucket names as AWS allows them for new buckets (3–63 of a-z 0-9 . -, starting and ending with a letter or digit). */
const BUCKET = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;
const REGION = /^[a-z0-9-]{2,40}$/;

export function storageConfigFromEnv(env: Env = process.env, rootDir: string = ROOT): StorageConfig {
  const kind = (value(env, 'STORAGE') ?? 'local').toLowerCase();
  if (kind === 'local') {
    return { kind: 'local', dir: path.resolve(rootDir, value(env, 'UPLOAD_DIR') ?? path.join(value(env, 'DATA_DIR') ?? '.data', 'uploads')) };
  }
  if (kind !== 's3') throw new StorageConfigError('STORAGE', `STORAGE must be "local" or "s3", got "${env.STORAGE}".`);

  const bucket = value(env, 'S3_BUCKET');
  if (!bucket) throw new StorageConfigError('S3_BUCKET', 'S3_BUCKET is required when STORAGE=s3 (the bucket that keeps the attachments).');
  if (!BUCKET.test(bucket) || bucket.includes('..')) {
    throw new StorageConfigError('S3_BUCKET', `S3_BUCKET must be a bucket name of 3 to 63 lowercase letters, digits, "." and "-", got "${bucket}".`);
  }

  const region = value(env, 'S3_REGION') ?? 'us-east-1';
  if (!REGION.test(region)) throw new StorageConfigError('S3_REGION', `S3_REGION must be a region name such as us-east-1, got "${region}".`);

  const endpointRaw = value(env, 'S3_ENDPOINT');
  let endpoint: string | null = null;
  if (endpointRaw) {
    let url: URL;
    try {
      url = new URL(endpointRaw);
    } catch {
      throw new StorageConfigError('S3_ENDPOINT', `S3_ENDPOINT must be an absolute http(s) URL such as http://127.0.0.1:9000, got "${endpointRaw}".`);
    }
    if (url.protocol !== 'http:' && url.protocol !== 'https:') {
      throw new StorageConfigError('S3_ENDPOINT', `S3_ENDPOINT must start with http:// or https://, got "${endpointRaw}".`);
    }
    endpoint = endpointRaw.replace(/\/+$/, '');
  }

  const accessKeyId = value(env, 'S3_ACCESS_KEY_ID') ?? null;
  const secretAccessKey = value(env, 'S3_SECRET_ACCESS_KEY') ?? null;
  if (accessKeyId && !secretAccessKey) {
    throw new StorageConfigError('S3_SECRET_ACCESS_KEY', 'S3_SECRET_ACCESS_KEY is required when S3_ACCESS_KEY_ID is set.');
  }
  if (secretAccessKey && !accessKeyId) {
    throw new StorageConfigError('S3_ACCESS_KEY_ID', 'S3_ACCESS_KEY_ID is required when S3_SECRET_ACCESS_KEY is set.');
  }

  const pathStyleRaw = value(env, 'S3_FORCE_PATH_STYLE')?.toLowerCase();
  let forcePathStyle = endpoint !== null;
  if (pathStyleRaw !== undefined) {
    if (['true', '1', 'yes'].includes(pathStyleRaw)) forcePathStyle = true;
    else if (['false', '0', 'no'].includes(pathStyleRaw)) forcePathStyle = false;
    else throw new StorageConfigError('S3_FORCE_PATH_STYLE', `S3_FORCE_PATH_STYLE must be true or false, got "${env.S3_FORCE_PATH_STYLE}".`);
  }

  return { kind: 's3', endpoint, region, bucket, accessKeyId, secretAccessKey, forcePathStyle };
}

export function storageFromConfig(cfg: StorageConfig): LocalStore | S3Store {
  if (cfg.kind === 'local') return new LocalStore(cfg.dir);
  if (cfg.kind === 's3') return new S3Store(cfg);
  throw new StorageConfigError('STORAGE', `Unknown storage kind "${(cfg as { kind: string }).kind}".`);
}

/** The store the environment describes (see the variables above); throws StorageConfigError naming the variable. */
export function storageFromEnv(env: Env = process.env, rootDir: string = ROOT): LocalStore | S3Store {
  return storageFromConfig(storageConfigFromEnv(env, rootDir));
}
