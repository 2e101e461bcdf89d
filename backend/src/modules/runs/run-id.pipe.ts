import type { PipeTransform } from '@nestjs/common';
import { badRequest } from '../../common/app-error.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A run id: a UUID or `latest` (the newest finished run of the doc set). */
export class RunIdPipe implements PipeTransform<string, string> {
  transform(value: string): string {
    if (value === 'latest' || UUID.test(value)) return value.toLowerCase();
    throw badRequest('VALIDATION_FAILED', 'The run id must be a UUID or "latest".');
  }
}
