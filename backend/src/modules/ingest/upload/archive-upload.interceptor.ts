/**
 * Runs multer for the one `archive` file part with the limits of docs/threats.md, "Limits", before the handler.
 * Our own interceptor rather than Nest's FileInterceptor so every multer/busboy failure gets a stable code.
 */
import { type CallHandler, type ExecutionContext, Inject, Injectable, type NestInterceptor } from '@nestjs/common';
import type { Request, Response } from 'express';
import multer from 'multer';
import type { Observable } from 'rxjs';
import { APP_CONFIG, type AppConfig } from '../../../config/app-config.js';
import { uploadDirOf } from './upload-dir.js';
import { hashingDiskStorage } from './hashing-disk-storage.js';
import { toUploadError } from './upload-errors.js';

@Injectable()
export class ArchiveUploadInterceptor implements NestInterceptor {
  private readonly upload: ReturnType<multer.Multer['single']>;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {
    this.upload = multer({
      storage: hashingDiskStorage(uploadDirOf(config)),
      limits: {
        // multer needs an integer here (a float disables the check): docs/threats.md, "Limits".
        fileSize: Math.floor(config.uploadMaxBytes),
        files: 1,
        fields: 5,
        parts: 6,
        fieldNameSize: 100,
        fieldSize: 4096,
      },
    }).single('archive');
  }

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const http = context.switchToHttp();
    await new Promise<void>((resolve, reject) => {
      this.upload(http.getRequest<Request>(), http.getResponse<Response>(), (error?: unknown) =>
        error ? reject(toUploadError(error, this.config.uploadMaxBytes)) : resolve(),
      );
    });
    return next.handle();
  }
}
