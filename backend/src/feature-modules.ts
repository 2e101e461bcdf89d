import type { Type } from '@nestjs/common';

/** The product's capability modules (doc sets, imports, runs, work, mail...), listed once. */
export const FEATURE_MODULES: Type[] = [];
