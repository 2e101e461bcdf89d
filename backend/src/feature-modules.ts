import type { Type } from '@nestjs/common';
import { DocSetsModule } from './modules/doc-sets/doc-sets.module.js';
import { MailModule } from './modules/mail/mail.module.js';

/** The product's capability modules (doc sets, imports, runs, work, mail...), listed once. */
export const FEATURE_MODULES: Type[] = [MailModule, DocSetsModule];
