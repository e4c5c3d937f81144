import { Injectable } from '@nestjs/common';
import type { ImportPreviewRow } from '@tallyloom/core';
import { randomBytes } from 'node:crypto';
import type { ParsedSheet } from './import-files';

/** An upload waiting to be previewed and committed. */
export interface PendingImport {
  id: string;
  chapterId: number;
  uploadedBy: number;
  fileName: string;
  sha256: string;
  sheet: ParsedSheet;
  expiresAt: Date;
  /** The last preview's checked rows and the mapping they were checked with. */
  checked?: { mappingKey: string; rows: ImportPreviewRow[] };
}

export const PENDING_IMPORT_MINUTES = 30;

/**
 * Uploads between their upload and their commit, in this process's memory for 30 minutes.
 * Single-process only: behind several API processes an upload is found only by the one that
 * took it, and a restart forgets every upload (the person uploads again). Nothing is stored
 * in the database until the commit, so there is nothing to clean up there.
 */
@Injectable()
export class PendingImportStore {
  private readonly pending = new Map<string, PendingImport>();

  add(entry: Omit<PendingImport, 'id' | 'expiresAt'>, now = new Date()): PendingImport {
    this.sweep(now);
    const stored: PendingImport = {
      ...entry,
      id: randomBytes(18).toString('base64url'),
      expiresAt: new Date(now.getTime() + PENDING_IMPORT_MINUTES * 60_000),
    };
    this.pending.set(stored.id, stored);
    return stored;
  }

  get(id: string, now = new Date()): PendingImport | null {
    const entry = this.pending.get(id);
    if (!entry) return null;
    if (entry.expiresAt <= now) {
      this.pending.delete(id);
      return null;
    }
    return entry;
  }

  remove(id: string): void {
    this.pending.delete(id);
  }

  private sweep(now: Date): void {
    for (const [id, entry] of this.pending) if (entry.expiresAt <= now) this.pending.delete(id);
  }
}
