import type { TaskEventItem, TaskItem } from '@linkloom/shared';
import type { TaskEventRow } from '../../db/schema/index.js';
import type { TaskWithNames } from './tasks.repository.js';

export type { TaskEventItem, TaskItem };

export const today = (now = new Date()): string => now.toISOString().slice(0, 10);

export function toTaskItem(row: TaskWithNames, now = new Date()): TaskItem {
  return {
    id: row.id,
    docSetId: row.docSetId,
    docSetName: row.docSetName,
    pagePath: row.pagePath,
    kind: row.kind,
    title: row.title,
    details: row.details,
    finding: row.finding,
    assignee: row.assigneeId ? { id: row.assigneeId, name: row.assigneeName ?? '', email: row.assigneeEmail ?? '' } : null,
    priority: row.priority,
    dueDate: row.dueDate,
    overdue: !!row.dueDate && row.dueDate < today(now) && (row.status === 'open' || row.status === 'in-progress'),
    status: row.status,
    verification: row.verification,
    verifiedAt: row.verifiedAt?.toISOString() ?? null,
    check: row.lastCheck ?? null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toTaskEventItem(row: TaskEventRow): TaskEventItem {
  return {
    id: row.id,
    type: row.type,
    actor: { id: row.actorId, name: row.actorName },
    body: row.body,
    changes: row.changes,
    at: row.at.toISOString(),
  };
}
