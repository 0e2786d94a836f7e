/**
 * The upload pipeline for attachments (issue 7), in three steps the route runs in order:
 *
 *   acceptFiles()   multipart parsing with hard limits (multer): each file is streamed into a
 *                   temporary file and hashed as it arrives (./temp-files.ts), never held in memory;
 *                   413 / 400 naming `files`
 *   inspectFiles()  the type decided from the file's bytes (file-type), never from the client's name
 *                   or Content-Type; only PDF, PNG, JPEG and WebP: 415 naming `files.<i>`
 *   storeFiles()    each file copied from its temporary file into the store under a new random key;
 *                   all or nothing
 *
 * then discardUploads() removes the temporary files (the route calls it whatever happened; acceptFiles
 * also does when the response closes, and multer does when it refuses the body or the client goes
 * away), and removeStored() takes stored objects back when the transaction that records them fails.
 */
import fs from 'node:fs';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { fileTypeFromBlob } from 'file-type/core';
import multer, { MulterError } from 'multer';
import { ATTACHMENT_MAX_BYTES, ATTACHMENT_TYPES, ATTACHMENTS_MAX, type AttachmentType } from '../../shared/submissions/types';
import { HttpError } from '../http/errors';
import { newAttachmentKey, type ObjectStore } from '../storage';
import { HashingTempStorage, removeTempFile, sweepStaleTempFiles, uploadTempDir, type UploadedTempFile } from './temp-files';

export interface AcceptFilesOptions {
  /** The multipart field that carries the files (default "files"). */
  field?: string;
  maxFiles?: number;
  /** Per file. */
  maxBytes?: number;
  /** Text fields beside the files (default 20). */
  maxFields?: number;
  /** Per text field, in bytes (default 64 kB). */
  maxFieldBytes?: number;
  /** Where files wait while the request is handled (default UPLOAD_TMP_DIR, else the system's temporary directory). */
  tmpDir?: string;
}

export interface InspectedFile {
  /** The submitter's file name, for display only: basename, no control or format characters, ≤ 200 characters. */
  name: string;
  mediaType: AttachmentType;
  size: number;
  /** Of the bytes, 64 lowercase hex digits (hashed as they arrived). */
  sha256: string;
  /** The temporary file that holds the bytes. */
  path: string;
}

export interface StoredFile {
  key: string;
  name: string;
  mediaType: AttachmentType;
  size: number;
  sha256: string;
}

const MB = 1024 * 1024;
const sizeText = (bytes: number) => (bytes % MB === 0 ? `${bytes / MB} MB` : bytes % 1024 === 0 ? `${bytes / 1024} kB` : `${bytes} bytes`);

/**
 * Parses a multipart/form-data body: files of `field` into req.files (an array), text fields into
 * req.body. A request that is not multipart passes through with req.files = [] (the route decides
 * whether files were required). Multer's errors become HttpErrors in the API's error shape.
 */
export function acceptFiles(opts: AcceptFilesOptions = {}): RequestHandler {
  const field = opts.field ?? 'files';
  const maxFiles = opts.maxFiles ?? ATTACHMENTS_MAX;
  const maxBytes = opts.maxBytes ?? ATTACHMENT_MAX_BYTES;
  const maxFields = opts.maxFields ?? 20;
  const maxFieldBytes = opts.maxFieldBytes ?? 64 * 1024;
  const storage = new HashingTempStorage(opts.tmpDir ?? uploadTempDir());
  // Files left by an app process that was killed mid-upload (never throws).
  void sweepStaleTempFiles(storage.dir);
  const upload = multer({
    storage,
    // Browsers send file names as raw UTF-8 (WHATWG multipart/form-data), not Latin-1.
    defParamCharset: 'utf8',
    limits: {
      fileSize: maxBytes,
      files: maxFiles,
      fields: maxFields,
      fieldSize: maxFieldBytes,
      fieldNameSize: 100,
      parts: maxFiles + maxFields,
      headerPairs: 100,
    },
  }).array(field, maxFiles);

  const translate = (err: unknown): unknown => {
    if (!(err instanceof MulterError)) {
      // busboy's own complaints about the body ("Unexpected end of form", "Malformed part header", a missing boundary).
      const message = (err as Error)?.message ?? '';
      if (/form|part|boundary|multipart/i.test(message) && !(err instanceof HttpError)) {
        return new HttpError(400, 'malformed_multipart', `The multipart/form-data body could not be read: ${message}.`);
      }
      return err;
    }
    const named = err.field ?? '';
    switch (err.code) {
      case 'LIMIT_FILE_SIZE':
        return new HttpError(413, 'file_too_large', `Each file may be at most ${sizeText(maxBytes)}.`, { [field]: `each file at most ${sizeText(maxBytes)}` });
      case 'LIMIT_FILE_COUNT':
        return new HttpError(400, 'too_many_files', `Attach at most ${maxFiles} files.`, { [field]: `at most ${maxFiles} files` });
      case 'LIMIT_UNEXPECTED_FILE':
        if (named === field) return new HttpError(400, 'too_many_files', `Attach at most ${maxFiles} files.`, { [field]: `at most ${maxFiles} files` });
        return new HttpError(400, 'unexpected_file_field', `The field "${named}" does not take files; attach them to "${field}".`, {
          [`body.${named}`]: `does not take files; attach them to "${field}"`,
        });
      case 'LIMIT_FIELD_VALUE':
        return new HttpError(400, 'field_too_long', `The field "${named}" is longer than ${sizeText(maxFieldBytes)}.`, {
          [`body.${named}`]: `at most ${sizeText(maxFieldBytes)}`,
        });
      case 'LIMIT_FIELD_COUNT':
      case 'LIMIT_PART_COUNT':
        return new HttpError(400, 'too_many_fields', `The form has more parts than the server accepts (at most ${maxFields} fields and ${maxFiles} files).`);
      default:
        return new HttpError(400, 'malformed_multipart', `The multipart/form-data body was refused: ${err.message}${named ? ` (field "${named}")` : ''}.`);
    }
  };

  return (req: Request, res: Response, next: NextFunction) => {
    upload(req, res, (err?: unknown) => {
      // On an error multer has removed every file it wrote.
      if (err) return next(translate(err));
      if (!Array.isArray(req.files)) req.files = [];
      // Whatever the route does, no temporary file outlives the response.
      if (req.files.length) res.once('close', () => void discardUploads(req));
      next();
    });
  };
}

/** The files acceptFiles() left on the request (always an array), each in its temporary file. */
export function uploadedFiles(req: Request): UploadedTempFile[] {
  return Array.isArray(req.files) ? req.files : [];
}

/** Removes the request's temporary files (idempotent; never throws). Routes call it before answering. */
export async function discardUploads(req: Request): Promise<void> {
  await Promise.all(uploadedFiles(req).map((f) => (f.path ? removeTempFile(f.path).catch(() => {}) : undefined)));
}

const TYPE_NAMES = 'a PDF, PNG, JPEG or WebP image';
const ALLOWED = new Set<string>(ATTACHMENT_TYPES);
export const MAX_NAME_LENGTH = 200;

/**
 * The name to show: the last segment of a path (either slash), NFC, without control (Cc) or format (Cf:
 * bidi overrides, zero-width) characters, whitespace collapsed, at most 200 characters (the extension
 * kept when the name is cut). "attachment" when nothing is left.
 */
export function displayName(original: string | undefined): string {
  let name = (original ?? '').normalize('NFC');
  name = name.split(/[/\\]/).pop() ?? '';
  name = name.replace(/[\p{Cc}\p{Cf}]/gu, '').replace(/\s+/gu, ' ').trim();
  if (name === '' || name === '.' || name === '..') return 'attachment';
  const chars = Array.from(name);
  if (chars.length <= MAX_NAME_LENGTH) return name;
  const dot = name.lastIndexOf('.');
  const ext = dot > 0 ? Array.from(name.slice(dot)) : [];
  if (ext.length > 0 && ext.length <= 16) return chars.slice(0, MAX_NAME_LENGTH - ext.length - 1).join('') + '…' + ext.join('');
  return chars.slice(0, MAX_NAME_LENGTH - 1).join('') + '…';
}

/** The type of a file from its content; file-type reads only as far into the file as it needs. */
async function detect(file: string): Promise<{ ext: string; mime: string } | undefined> {
  try {
    return await fileTypeFromBlob(await fs.openAsBlob(file));
  } catch {
    return undefined; // a file-type parser choking on malformed bytes: not a file we recognise
  }
}

/**
 * Decides each file's type from its bytes and hashes it. Refuses (all files checked, every problem
 * named): an empty file → 400 'empty_file'; a type other than PDF, PNG, JPEG, WebP → 415
 * 'unsupported_media_type', each keyed files.<i> and saying what the content was.
 */
export async function inspectFiles(files: readonly UploadedTempFile[]): Promise<InspectedFile[]> {
  const empty: Record<string, string> = {};
  const unsupported: Record<string, string> = {};
  const out: InspectedFile[] = [];
  for (const [i, file] of files.entries()) {
    if (!file.path || !file.sha256) throw new Error('inspectFiles: each file must come from acceptFiles() (a temporary file and its SHA-256)');
    if (file.size === 0) {
      empty[`files.${i}`] = 'this file is empty';
      continue;
    }
    const found = await detect(file.path);
    if (!found || !ALLOWED.has(found.mime)) {
      const what = found ? `${found.mime} (.${found.ext})` : 'not a recognised file';
      unsupported[`files.${i}`] = `this file is ${what}, not ${TYPE_NAMES}`;
      continue;
    }
    out.push({
      name: displayName(file.originalname),
      mediaType: found.mime as AttachmentType,
      size: file.size,
      sha256: file.sha256,
      path: file.path,
    });
  }
  if (Object.keys(empty).length) {
    const names = Object.keys(empty);
    throw new HttpError(400, 'empty_file', `${names.join(', ')}: the file is empty.`, { ...empty, ...unsupported });
  }
  if (Object.keys(unsupported).length) {
    const names = Object.keys(unsupported);
    throw new HttpError(415, 'unsupported_media_type', `Attachments must be PDF, PNG, JPEG or WebP files; ${names.join(', ')}: ${unsupported[names[0]]}.`, unsupported);
  }
  return out;
}

export interface StoreFilesOptions {
  /** Told about each object that a failed storeFiles could not take back (to log it). */
  onOrphan?: (key: string, err: unknown) => void;
  /** For the year and month in the keys (default now). */
  now?: Date;
}

/**
 * Copies each file from its temporary file into the store under a new key
 * (attachments/<yyyy>/<mm>/<32 hex>), one after the other; the store checks the SHA-256 of what it
 * wrote against the one taken as the bytes arrived. If a put
 * fails, the objects already put (and the failed key, in case the store kept it) are deleted and the
 * error is rethrown: nothing is left half-stored.
 */
export async function storeFiles(store: ObjectStore, files: readonly InspectedFile[], opts: StoreFilesOptions = {}): Promise<StoredFile[]> {
  const stored: StoredFile[] = [];
  for (const file of files) {
    const key = newAttachmentKey(opts.now);
    try {
      await store.putFile(key, file.path, { contentType: file.mediaType, sha256: file.sha256 });
    } catch (err) {
      await removeStored(store, [...stored, { key }], opts.onOrphan);
      throw err;
    }
    stored.push({ key, name: file.name, mediaType: file.mediaType, size: file.size, sha256: file.sha256 });
  }
  return stored;
}

/**
 * Deletes stored objects (the caller's undo when the transaction recording them fails). Never throws:
 * tries every key and returns those it could not delete (each also given to onOrphan).
 */
export async function removeStored(
  store: ObjectStore,
  stored: readonly Pick<StoredFile, 'key'>[],
  onOrphan?: (key: string, err: unknown) => void,
): Promise<string[]> {
  const results = await Promise.allSettled(stored.map((s) => store.delete(s.key)));
  const failed: string[] = [];
  results.forEach((r, i) => {
    if (r.status === 'rejected') {
      failed.push(stored[i].key);
      onOrphan?.(stored[i].key, r.reason);
    }
  });
  return failed;
}
