import { Injectable } from '@nestjs/common';
import { and, asc, count, eq, getTableColumns, gt, inArray, isNull, notExists, notInArray, type SQL, sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import type { Executor } from '../../db/database.js';
import {
  pruningCandidates,
  pruningDecisions,
  pruningLists,
  pruningNominations,
  type PruningCandidateRow,
  type PruningDecisionRow,
} from '../../db/schema/index.js';

export type NewCandidate = typeof pruningCandidates.$inferInsert;
export type NewDecision = typeof pruningDecisions.$inferInsert;
export type NominationRow = typeof pruningNominations.$inferSelect;
export type ListStatus = 'undecided' | 'approve' | 'reject' | 'keep' | 'flagged';
export type CandidateWithDecision = PruningCandidateRow & { decision: PruningDecisionRow | null };

const BATCH = 500;

@Injectable()
export class PruningRepository {
  constructor(private readonly database: DbService) {}

  async list(docSetId: string): Promise<{ version: number; runId: string | null }> {
    const [row] = await this.database.db.select().from(pruningLists).where(eq(pruningLists.docSetId, docSetId)).limit(1);
    return { version: row?.version ?? 0, runId: row?.runId ?? null };
  }

  /**
   * The optimistic-concurrency step (docs/threats.md check 63): the version moves on only if it still equals the
   * one the client read. Returns the new version, or null when someone else changed the list first.
   */
  async advanceVersion(docSetId: string, expected: number | null, tx: Executor, runId?: string): Promise<number | null> {
    await tx.insert(pruningLists).values({ docSetId }).onConflictDoNothing();
    const where =
      expected === null
        ? eq(pruningLists.docSetId, docSetId)
        : and(eq(pruningLists.docSetId, docSetId), eq(pruningLists.version, expected));
    const [row] = await tx
      .update(pruningLists)
      .set({ version: sql`${pruningLists.version} + 1`, updatedAt: new Date(), ...(runId ? { runId } : {}) })
      .where(where)
      .returning({ version: pruningLists.version });
    return row?.version ?? null;
  }

  async candidates(docSetId: string, paths?: string[]): Promise<PruningCandidateRow[]> {
    if (paths && paths.length === 0) return [];
    return this.database.db
      .select()
      .from(pruningCandidates)
      .where(and(eq(pruningCandidates.docSetId, docSetId), paths ? inArray(pruningCandidates.path, paths) : undefined));
  }

  /** Upserts the run's rows (keeping when each page was first proposed) and drops rows no longer listed. */
  async replaceCandidates(docSetId: string, rows: NewCandidate[], tx: Executor): Promise<void> {
    for (let i = 0; i < rows.length; i += BATCH) {
      await tx
        .insert(pruningCandidates)
        .values(rows.slice(i, i + BATCH))
        .onConflictDoUpdate({
          target: [pruningCandidates.docSetId, pruningCandidates.path],
          set: {
            runId: sql`excluded.run_id`,
            title: sql`excluded.title`,
            reasons: sql`excluded.reasons`,
            inboundCount: sql`excluded.inbound_count`,
            stationaryScore: sql`excluded.stationary_score`,
            wordCount: sql`excluded.word_count`,
            reviewedAt: sql`excluded.reviewed_at`,
            inLatestRun: sql`excluded.in_latest_run`,
          },
        });
    }
    const keep = rows.map((r) => r.path);
    await tx
      .delete(pruningCandidates)
      .where(and(eq(pruningCandidates.docSetId, docSetId), keep.length ? notInArray(pruningCandidates.path, keep) : undefined));
  }

  async upsertCandidate(row: NewCandidate, tx: Executor): Promise<void> {
    await tx
      .insert(pruningCandidates)
      .values(row)
      .onConflictDoUpdate({ target: [pruningCandidates.docSetId, pruningCandidates.path], set: { reasons: row.reasons } });
  }

  async page(
    docSetId: string,
    status: ListStatus | undefined,
    offset: number,
    limit: number,
  ): Promise<{ rows: CandidateWithDecision[]; total: number }> {
    const where = and(eq(pruningCandidates.docSetId, docSetId), statusCondition(status));
    const from = () =>
      this.database.db
        .select({ c: getTableColumns(pruningCandidates), d: getTableColumns(pruningDecisions) })
        .from(pruningCandidates)
        .leftJoin(
          pruningDecisions,
          and(eq(pruningDecisions.docSetId, pruningCandidates.docSetId), eq(pruningDecisions.path, pruningCandidates.path)),
        );
    const rows = await from().where(where).orderBy(asc(pruningCandidates.path)).offset(offset).limit(limit);
    const [{ value }] = await this.database.db
      .select({ value: count() })
      .from(pruningCandidates)
      .leftJoin(
        pruningDecisions,
        and(eq(pruningDecisions.docSetId, pruningCandidates.docSetId), eq(pruningDecisions.path, pruningCandidates.path)),
      )
      .where(where);
    return { rows: rows.map((r) => ({ ...r.c, decision: r.d?.path ? (r.d as PruningDecisionRow) : null })), total: value };
  }

  async decisions(docSetId: string, only?: PruningDecisionRow['decision']): Promise<PruningDecisionRow[]> {
    return this.database.db
      .select()
      .from(pruningDecisions)
      .where(and(eq(pruningDecisions.docSetId, docSetId), only ? eq(pruningDecisions.decision, only) : undefined))
      .orderBy(asc(pruningDecisions.path));
  }

  /** Decisions made after `since`, oldest first. */
  async decisionsSince(docSetId: string, since: Date): Promise<PruningDecisionRow[]> {
    return this.database.db
      .select()
      .from(pruningDecisions)
      .where(and(eq(pruningDecisions.docSetId, docSetId), gt(pruningDecisions.decidedAt, since)))
      .orderBy(asc(pruningDecisions.decidedAt), asc(pruningDecisions.path))
      .limit(200);
  }

  /** Pages on the list that wait for a decision: never decided, or decided and flagged for another look. */
  async waitingCount(docSetId: string): Promise<number> {
    const decided = this.database.db
      .select({ path: pruningDecisions.path })
      .from(pruningDecisions)
      .where(
        and(eq(pruningDecisions.docSetId, docSetId), eq(pruningDecisions.path, pruningCandidates.path), isNull(pruningDecisions.flaggedAt)),
      );
    const [{ value }] = await this.database.db
      .select({ value: count() })
      .from(pruningCandidates)
      .where(and(eq(pruningCandidates.docSetId, docSetId), eq(pruningCandidates.inLatestRun, true), notExists(decided)));
    return value;
  }

  async upsertDecisions(rows: NewDecision[], tx: Executor): Promise<void> {
    if (rows.length === 0) return;
    await tx
      .insert(pruningDecisions)
      .values(rows)
      .onConflictDoUpdate({
        target: [pruningDecisions.docSetId, pruningDecisions.path],
        set: {
          decision: sql`excluded.decision`,
          note: sql`excluded.note`,
          decidedBy: sql`excluded.decided_by`,
          decidedByName: sql`excluded.decided_by_name`,
          decidedAt: sql`excluded.decided_at`,
          inboundAtDecision: sql`excluded.inbound_at_decision`,
          flaggedAt: null,
          flagReason: null,
        },
      });
  }

  async flagDecision(docSetId: string, path: string, reason: string, tx: Executor): Promise<void> {
    await tx
      .update(pruningDecisions)
      .set({ flaggedAt: new Date(), flagReason: reason })
      .where(and(eq(pruningDecisions.docSetId, docSetId), eq(pruningDecisions.path, path)));
  }

  async nominations(docSetId: string, paths?: string[]): Promise<NominationRow[]> {
    if (paths && paths.length === 0) return [];
    return this.database.db
      .select()
      .from(pruningNominations)
      .where(and(eq(pruningNominations.docSetId, docSetId), paths ? inArray(pruningNominations.path, paths) : undefined))
      .orderBy(asc(pruningNominations.at));
  }

  async insertNomination(row: typeof pruningNominations.$inferInsert, tx: Executor): Promise<void> {
    await tx
      .insert(pruningNominations)
      .values(row)
      .onConflictDoUpdate({
        target: [pruningNominations.docSetId, pruningNominations.path, pruningNominations.nominatedBy],
        set: { reason: row.reason, at: new Date() },
      });
  }
}

function statusCondition(status: ListStatus | undefined): SQL | undefined {
  if (!status) return undefined;
  if (status === 'undecided') return isNull(pruningDecisions.path);
  if (status === 'flagged') return sql`${pruningDecisions.flaggedAt} is not null`;
  return eq(pruningDecisions.decision, status);
}
