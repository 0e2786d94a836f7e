/** The shapes of the attachment store (server/storage/index.ts): one interface, two back ends. */
export interface ObjectMeta {
  contentType: string;
  /** 64 lowercase hex digits. */
  sha256: string;
}

export interface StoredObject {
  body: NodeJS.ReadableStream;
  size: number;
  contentType: string;
  /** As given to put(); null for an object stored without it (by some other writer). */
  sha256: string | null;
}

export interface ObjectStore {
  /** Stores the bytes under the key (replacing any object there); resolves once they are durable. */
  put(key: string, body: Buffer, meta: ObjectMeta): Promise<void>;
  /**
   * Stores the bytes of a local file (an upload's temporary file) under the key, streamed, never
   * read into memory; rejects, storing nothing, when the bytes' SHA-256 differs from meta.sha256.
   * The file is left where it is. Resolves once the object is durable.
   */
  putFile(key: string, file: string, meta: ObjectMeta): Promise<void>;
  /** Streams the object; rejects with ObjectNotFoundError when the key is not stored. */
  get(key: string): Promise<StoredObject>;
  /** Removes the object; a missing key is not an error. */
  delete(key: string): Promise<void>;
  exists(key: string): Promise<boolean>;
  readonly kind: 'local' | 's3';
}

export interface LocalStorageConfig {
  kind: 'local';
  /** Absolute directory. */
  dir: string;
}

export interface S3StorageConfig {
  kind: 's3';
  endpoint: string | null;
  region: string;
  bucket: string;
  accessKeyId: string | null;
  secretAccessKey: string | null;
  forcePathStyle: boolean;
}
