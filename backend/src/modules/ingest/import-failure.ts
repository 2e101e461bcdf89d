/** Why an import stopped, as the code and sentence stored on the failed snapshot. */
import { ArchiveError } from './archive/index.js';
import { ParsePoolError } from './parse/parse-pool.js';

export class ImportFailure extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

export const importTimedOut = (seconds: number): ImportFailure =>
  new ImportFailure('IMPORT_TIMEOUT', `The import took longer than ${seconds} s and was stopped; split the doc set or try again later.`);

export const interrupted = (): ImportFailure => new ImportFailure('INTERRUPTED', 'The import was interrupted by a restart; upload again.');

/** Archive and parser failures keep their codes; anything else is an internal error (logged, not shown). */
export function toImportFailure(error: unknown): { failure: ImportFailure; internal: boolean } {
  if (error instanceof ImportFailure) return { failure: error, internal: false };
  if (error instanceof ArchiveError) {
    const detail = error.details[0] ? ` ${error.details[0]}.` : '';
    return { failure: new ImportFailure(error.code, `${error.message}${detail}`), internal: false };
  }
  if (error instanceof ParsePoolError) {
    return {
      failure: new ImportFailure(error.code, 'A page needed more memory than the parser may use; the import was stopped.'),
      internal: false,
    };
  }
  return {
    failure: new ImportFailure(
      'IMPORT_FAILED',
      'The import failed because of an error on our side; try again, and report it if it keeps failing.',
    ),
    internal: true,
  };
}
