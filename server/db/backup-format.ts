/** The backup archive's format: its manifest, where backups go and how they are named (backup.ts). */
import path from 'node:path';
import { ROOT } from '../config';

export const BACKUP_FORMAT = 'counterweight-backup';
export const BACKUP_FORMAT_VERSION = 1;

export interface ManifestObject {
  key: string;
  /** Path inside the archive: objects/<key>. */
  file: string;
  size: number;
  sha256: string;
  contentType: string;
}

export interface BackupManifest {
  format: typeof BACKUP_FORMAT;
  formatVersion: number;
  createdAt: string;
  appVersion: string | null;
  database: { name: string; file: string; size: number; sha256: string; tool: string };
  attachments: ManifestObject[];
  /** Attachments the database lists but the store could not give, or whose bytes differ from the row's SHA-256. */
  problems: string[];
}

/** A restore that was refused before anything was written (non-empty database, bad checksum, …). */
export class RestoreRefusedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'RestoreRefusedError';
  }
}

type Env = Record<string, string | undefined>;

/** BACKUP_DIR (relative to the project root), default <DATA_DIR>/backups, i.e. .data/backups. */
export function backupDirFromEnv(env: Env = process.env, rootDir: string = ROOT): string {
  const raw = env.BACKUP_DIR?.trim();
  return path.resolve(rootDir, raw ? raw : path.join(env.DATA_DIR?.trim() || '.data', 'backups'));
}

/** 2026-03-04T05:06:07.890Z → 20260304T050607Z */
export function backupTimestamp(now: Date): string {
  return now.toISOString().replace(/\.\d{3}Z$/, 'Z').replace(/[-:]/g, '');
}
