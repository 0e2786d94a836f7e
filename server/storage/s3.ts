/**
 * Objects in an S3 bucket (AWS S3 or a compatible service: MinIO, Ceph, s3rver in the tests).
 * The SHA-256 goes with each object twice: as user metadata (x-amz-meta-sha256, read back by get)
 * and as ChecksumSHA256, which S3 itself verifies on upload (services that do not know it ignore it).
 */
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';
import fs from 'node:fs';
import path from 'node:path';
import type { Readable } from 'node:stream';
import type { ObjectMeta, ObjectStore, S3StorageConfig, StoredObject } from './types';
import { assertKey, ObjectNotFoundError, SHA256_HEX } from './keys';

type AwsError = { name?: string; Code?: string; $metadata?: { httpStatusCode?: number } };
/** NoSuchKey from GetObject (a missing bucket is NoSuchBucket, a configuration error, and stays an error). */
const isNoSuchKey = (err: unknown) => {
  const e = err as AwsError;
  return e?.name === 'NoSuchKey' || e?.Code === 'NoSuchKey';
};
/** A 404 to a HEAD request (no body, so a missing bucket looks the same as a missing key). */
const isNotFound = (err: unknown) => {
  const e = err as AwsError;
  return e?.name === 'NotFound' || e?.name === 'NoSuchKey' || e?.name === 'NoSuchBucket' || e?.$metadata?.httpStatusCode === 404;
};

export class S3Store implements ObjectStore {
  readonly kind = 's3' as const;
  readonly bucket: string;
  readonly client: S3Client;

  constructor(cfg: S3StorageConfig) {
    this.bucket = cfg.bucket;
    this.client = new S3Client({
      region: cfg.region,
      endpoint: cfg.endpoint ?? undefined,
      forcePathStyle: cfg.forcePathStyle,
      // Without keys, the SDK's default chain (environment, profile, instance role) applies.
      credentials: cfg.accessKeyId && cfg.secretAccessKey ? { accessKeyId: cfg.accessKeyId, secretAccessKey: cfg.secretAccessKey } : undefined,
    });
  }

  async put(key: string, body: Buffer, meta: ObjectMeta): Promise<void> {
    assertKey(key);
    if (!Buffer.isBuffer(body)) throw new TypeError('put() takes the body as a Buffer');
    if (!meta.contentType) throw new TypeError('put() needs a contentType');
    if (!SHA256_HEX.test(meta.sha256)) throw new TypeError('put() needs the SHA-256 as 64 lowercase hex digits');
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.bucket,
        Key: key,
        Body: body,
        ContentLength: body.length,
        ContentType: meta.contentType,
        Metadata: { sha256: meta.sha256 },
        ChecksumSHA256: Buffer.from(meta.sha256, 'hex').toString('base64'),
      }),
    );
  }

  /** Streams the file to S3; S3 checks ChecksumSHA256 against the bytes it received and refuses a mismatch. */
  async putFile(key: string, file: string, meta: ObjectMeta): Promise<void> {
    assertKey(key);
    if (typeof file !== 'string' || !path.isAbsolute(file)) throw new TypeError('putFile() takes the absolute path of a file');
    if (!meta.contentType) throw new TypeError('put() needs a contentType');
    if (!SHA256_HEX.test(meta.sha256)) throw new TypeError('put() needs the SHA-256 as 64 lowercase hex digits');
    const { size } = await fs.promises.stat(file);
    const body = fs.createReadStream(file);
    try {
      await this.client.send(
        new PutObjectCommand({
          Bucket: this.bucket,
          Key: key,
          Body: body,
          ContentLength: size,
          ContentType: meta.contentType,
          Metadata: { sha256: meta.sha256 },
          ChecksumSHA256: Buffer.from(meta.sha256, 'hex').toString('base64'),
        }),
      );
    } finally {
      body.destroy();
    }
  }

  async get(key: string): Promise<StoredObject> {
    assertKey(key);
    try {
      const res = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      return {
        body: res.Body as Readable,
        size: Number(res.ContentLength ?? 0),
        contentType: res.ContentType ?? 'application/octet-stream',
        sha256: res.Metadata?.sha256 ?? null,
      };
    } catch (err) {
      if (isNoSuchKey(err)) throw new ObjectNotFoundError(key);
      throw err;
    }
  }

  /** S3's DeleteObject succeeds for a missing key too. */
  async delete(key: string): Promise<void> {
    assertKey(key);
    await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
  }

  async exists(key: string): Promise<boolean> {
    assertKey(key);
    try {
      await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key }));
      return true;
    } catch (err) {
      if (isNotFound(err)) return false;
      throw err;
    }
  }

  /** Creates the bucket when it is missing (development and tests; production buckets are made by their operators). */
  async ensureBucket(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
    } catch (err) {
      if (!isNotFound(err)) throw err;
      await this.client.send(new CreateBucketCommand({ Bucket: this.bucket }));
    }
  }

  /** Closes the client's sockets. */
  close(): void {
    this.client.destroy();
  }
}
