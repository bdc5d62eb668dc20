import { randomUUID } from 'node:crypto';
import { mkdir, unlink, writeFile } from 'node:fs/promises';
import path from 'node:path';

const storedNamePattern =
  /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\.[a-z]{3,7}$/;

/**
 * Uploaded files on disk, in one folder outside the web root, each under a generated name
 * (a random UUID and the extension of its detected type). Nothing the uploader sends ever
 * becomes part of a path.
 */
export class DocumentStore {
  readonly dir: string;

  constructor(dir: string) {
    this.dir = path.resolve(dir);
  }

  /** Writes the bytes under a new name (never over an existing file); answers the name. */
  async save(bytes: Uint8Array, extension: string): Promise<string> {
    const storedName = `${randomUUID()}${extension}`;
    if (!storedNamePattern.test(storedName)) throw new Error('unexpected stored name');
    await mkdir(this.dir, { recursive: true, mode: 0o700 });
    await writeFile(this.pathOf(storedName), bytes, { flag: 'wx', mode: 0o600 });
    return storedName;
  }

  /** The absolute path of a stored file; throws for any name the store did not generate. */
  pathOf(storedName: string): string {
    if (!storedNamePattern.test(storedName)) throw new Error('not a stored document name');
    return path.join(this.dir, storedName);
  }

  async remove(storedName: string): Promise<void> {
    await unlink(this.pathOf(storedName)).catch(() => undefined);
  }
}
