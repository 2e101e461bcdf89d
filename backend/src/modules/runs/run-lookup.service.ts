import { Injectable } from '@nestjs/common';
import { conflict, forbidden, notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import type { RunRow } from '../../db/schema/index.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { RunsRepository } from './runs.repository.js';

const CACHE_MS = 1_000;
const CACHE_ENTRIES = 1_000;

function remember<K, V>(cache: Map<K, V>, key: K, value: V): void {
  if (cache.size >= CACHE_ENTRIES) cache.delete(cache.keys().next().value!);
  cache.set(key, value);
}

/**
 * Finds the run a result request names (an id or `latest`) and checks the caller may read the doc set.
 * Every page-list request does this, and with the embedded database each query costs milliseconds of the
 * one event loop, so answers are cached: finished runs never change; `latest` and a doc set's existence are
 * kept for a second (and `latest` is dropped at once when this process finishes a run).
 */
@Injectable()
export class RunLookup {
  private readonly finishedRuns = new Map<string, RunRow>();
  private readonly latest = new Map<string, { row: RunRow; until: number }>();
  private readonly knownDocSets = new Map<string, number>();

  constructor(
    private readonly runs: RunsRepository,
    private readonly docSets: DocSetsService,
  ) {}

  async resolve(actor: AuthUser, docSetId: string, runId: string, mustBeFinished = true): Promise<RunRow> {
    await this.checkDocSet(actor, docSetId);
    const row = runId === 'latest' ? await this.latestFinished(docSetId) : await this.findRun(docSetId, runId);
    if (!row) throw notFound(runId === 'latest' ? 'A finished run of this doc set' : 'The run');
    if (mustBeFinished && row.status !== 'finished') {
      throw conflict('RUN_NOT_FINISHED', `This run is ${row.status}; its results can be read once it has finished.`);
    }
    return row;
  }

  async checkDocSet(actor: AuthUser, docSetId: string): Promise<void> {
    if (actor.apiTokenDocSetId && actor.apiTokenDocSetId !== docSetId) throw forbidden('This API token belongs to another doc set.');
    if ((this.knownDocSets.get(docSetId) ?? 0) > Date.now()) return;
    await this.docSets.get(docSetId);
    remember(this.knownDocSets, docSetId, Date.now() + CACHE_MS);
  }

  forgetLatest(docSetId: string): void {
    this.latest.delete(docSetId);
  }

  private async findRun(docSetId: string, runId: string): Promise<RunRow | null> {
    const cached = this.finishedRuns.get(runId);
    if (cached && cached.docSetId === docSetId) return cached;
    const row = await this.runs.findInDocSet(docSetId, runId);
    if (row?.status === 'finished') remember(this.finishedRuns, runId, row);
    return row;
  }

  private async latestFinished(docSetId: string): Promise<RunRow | null> {
    const cached = this.latest.get(docSetId);
    if (cached && cached.until > Date.now()) return cached.row;
    const row = await this.runs.latestFinished(docSetId);
    if (row) remember(this.latest, docSetId, { row, until: Date.now() + CACHE_MS });
    return row;
  }
}
