/**
 * multer storage engine for archives (docs/threats.md, "Import pipeline" step 1): a random name in a dedicated folder, mode
 * 0600, created exclusively (`wx`), and the SHA-256 of the bytes computed while they stream to disk.
 */
import { createHash, randomBytes } from 'node:crypto';
import { createWriteStream, mkdirSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import type { Request } from 'express';
import type multer from 'multer';

export interface StoredUpload {
  path: string;
  size: number;
  sha256: string;
}

export function hashingDiskStorage(dir: string): multer.StorageEngine {
  return {
    _handleFile(
      _request: Request,
      file: Express.Multer.File,
      done: (error?: unknown, info?: Partial<Express.Multer.File> & StoredUpload) => void,
    ) {
      mkdirSync(dir, { recursive: true, mode: 0o700 });
      const path = join(dir, `${randomBytes(16).toString('hex')}.upload`);
      const hash = createHash('sha256');
      let size = 0;
      const count = async function* (source: AsyncIterable<Buffer>) {
        for await (const chunk of source) {
          hash.update(chunk);
          size += chunk.length;
          yield chunk;
        }
      };
      pipeline(file.stream, count, createWriteStream(path, { flags: 'wx', mode: 0o600 })).then(
        () => done(null, { path, size, sha256: hash.digest('hex') }),
        (error) => void rm(path, { force: true }).finally(() => done(error)),
      );
    },
    _removeFile(_request: Request, file: Express.Multer.File, done: (error: Error | null) => void) {
      rm(file.path, { force: true }).then(() => done(null), done);
    },
  };
}
