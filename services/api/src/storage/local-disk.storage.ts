import { Injectable } from '@nestjs/common';
import { copyFile, mkdir, open, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname } from 'node:path';
import type { Readable } from 'node:stream';
import { AppConfig } from '../config/app-config';
import { FileStorage, StoredFileMissing } from './file-storage';
import { newStorageKey, pathForKey } from './storage-layout';

/** Files under UPLOADS_DIR (default `<repo>/.data/uploads`), in sharded folders. */
@Injectable()
export class LocalDiskStorage extends FileStorage {
  constructor(private readonly config: AppConfig) {
    super();
  }

  async put(content: Buffer): Promise<{ key: string }> {
    const key = newStorageKey();
    const path = pathForKey(this.config.uploadsDir, key);
    await mkdir(dirname(path), { recursive: true });
    // Written aside and renamed, so a reader never sees half a file.
    const partial = `${path}.partial`;
    await writeFile(partial, content, { flag: 'wx', mode: 0o640 });
    await rename(partial, path);
    return { key };
  }

  async putFile(source: string): Promise<{ key: string; sizeBytes: number }> {
    const key = newStorageKey();
    const path = pathForKey(this.config.uploadsDir, key);
    await mkdir(dirname(path), { recursive: true });
    try {
      await rename(source, path);
    } catch (error) {
      // Another file system (a temp folder on its own mount): copy aside, then rename.
      if ((error as NodeJS.ErrnoException).code !== 'EXDEV') throw error;
      const partial = `${path}.partial`;
      await copyFile(source, partial);
      await rename(partial, path);
      await rm(source, { force: true });
    }
    return { key, sizeBytes: (await stat(path)).size };
  }

  async get(key: string): Promise<Readable> {
    try {
      const handle = await open(pathForKey(this.config.uploadsDir, key), 'r');
      return handle.createReadStream();
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') throw new StoredFileMissing(key);
      throw error;
    }
  }

  async remove(key: string): Promise<void> {
    await rm(pathForKey(this.config.uploadsDir, key), { force: true });
  }
}
