/** multer and busboy failures as the contract's errors (docs/threats.md checks 2-4): 413 for size, else 400. */
import { AppError } from '../../../common/app-error.js';
import { formatBytes } from '../archive/index.js';

const ONE_FILE = 'Send exactly one file, in the form field "archive".';

export function toUploadError(error: unknown, maxBytes: number): unknown {
  const code = (error as { code?: string })?.code;
  const name = (error as Error)?.name;
  if (name === 'MulterError') {
    if (code === 'LIMIT_FILE_SIZE') return new AppError(413, 'UPLOAD_TOO_LARGE', `File too large: the limit is ${formatBytes(maxBytes)}.`);
    if (code === 'LIMIT_FILE_COUNT' || code === 'LIMIT_UNEXPECTED_FILE') return new AppError(400, 'UPLOAD_UNEXPECTED_FILE', ONE_FILE);
    return new AppError(400, code ?? 'UPLOAD_INVALID', `The upload form is not valid: ${(error as Error).message}.`);
  }
  // busboy's parse errors ("Multipart: Boundary not found", "Unexpected end of form") and aborted requests.
  if (error instanceof Error && !(error instanceof AppError) && !('status' in error) && !('syscall' in error)) {
    const message = error.message.startsWith('Multipart:') ? error.message : `Multipart: ${error.message}`;
    return new AppError(400, 'UPLOAD_MALFORMED', `${message}. Send the archive as multipart/form-data.`);
  }
  return error;
}

export const missingFile = (): AppError => new AppError(400, 'UPLOAD_MISSING_FILE', ONE_FILE);
export const emptyUpload = (): AppError => new AppError(400, 'UPLOAD_EMPTY', 'The uploaded file is empty.');
