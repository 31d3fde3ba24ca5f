import { randomUUID } from 'node:crypto';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';

export type FileAcl = 'public-read' | 'private';
export type ContentDisposition = 'inline' | 'attachment';

export interface StoredFile {
  id: string;
  key: string;
  customId: string | null;
  name: string;
  size: number;
  type: string;
  /** md5 hex of the bytes, the same kind of hash uploadthing reports as fileHash. */
  fileHash: string;
  acl: FileAcl;
  contentDisposition: ContentDisposition;
  /** Epoch milliseconds, as the list API reports it. */
  uploadedAt: number;
}

interface IndexFile {
  version: 1;
  files: StoredFile[];
}

const INDEX_NAME = 'index.json';
const BLOB_DIR = 'files';

/**
 * Keeps uploaded bytes as one file per key under `<dataDir>/files` and their
 * descriptions in `<dataDir>/index.json`, so a restart of the stand-in keeps them.
 * Index writes go through a temp file and rename, and are chained so that two
 * uploads finishing together cannot interleave half-written JSON.
 */
export class FileStore {
  private readonly files = new Map<string, StoredFile>();
  private writeChain: Promise<void> = Promise.resolve();

  private constructor(private readonly dataDir: string) {}

  static async open(dataDir: string): Promise<FileStore> {
    const store = new FileStore(dataDir);
    await mkdir(path.join(dataDir, BLOB_DIR), { recursive: true });
    try {
      const raw = await readFile(path.join(dataDir, INDEX_NAME), 'utf8');
      const index = JSON.parse(raw) as IndexFile;
      for (const file of index.files) store.files.set(file.key, file);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
    }
    return store;
  }

  get(key: string): StoredFile | undefined {
    return this.files.get(key);
  }

  findByCustomId(customId: string): StoredFile | undefined {
    for (const file of this.files.values()) if (file.customId === customId) return file;
    return undefined;
  }

  /** Files in the order they were uploaded, oldest first. */
  list(): StoredFile[] {
    return [...this.files.values()].sort((a, b) => a.uploadedAt - b.uploadedAt);
  }

  async put(description: Omit<StoredFile, 'id' | 'uploadedAt'>, bytes: Uint8Array): Promise<StoredFile> {
    const stored: StoredFile = { ...description, id: randomUUID(), uploadedAt: Date.now() };
    const blobPath = this.blobPath(stored.key);
    await writeFile(blobPath + '.partial', bytes);
    await rename(blobPath + '.partial', blobPath);
    this.files.set(stored.key, stored);
    await this.persistIndex();
    return stored;
  }

  async update(key: string, change: Partial<Pick<StoredFile, 'name' | 'acl'>>): Promise<boolean> {
    const current = this.files.get(key);
    if (!current) return false;
    this.files.set(key, { ...current, ...change });
    await this.persistIndex();
    return true;
  }

  async remove(keys: string[]): Promise<number> {
    let removed = 0;
    for (const key of keys) {
      if (!this.files.delete(key)) continue;
      removed += 1;
      await rm(this.blobPath(key), { force: true });
    }
    if (removed > 0) await this.persistIndex();
    return removed;
  }

  async readBytes(key: string): Promise<Buffer> {
    return readFile(this.blobPath(key));
  }

  private blobPath(key: string): string {
    // Keys come from the SDK's sqids alphabet; encoding still keeps any odd key inside the folder.
    return path.join(this.dataDir, BLOB_DIR, encodeURIComponent(key));
  }

  private persistIndex(): Promise<void> {
    const next = this.writeChain.then(async () => {
      const index: IndexFile = { version: 1, files: this.list() };
      const indexPath = path.join(this.dataDir, INDEX_NAME);
      await writeFile(indexPath + '.partial', JSON.stringify(index, null, 2));
      await rename(indexPath + '.partial', indexPath);
    });
    this.writeChain = next.catch(() => undefined);
    return next;
  }
}
