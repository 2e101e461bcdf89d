// Who may do what with fix tasks (docs/threats.md checks 56, 57, 60): editors and admins manage every task;
// writers work on their own tasks only and may not reassign or reshape them; viewers only read.
import { roleAtLeast, type Role } from '@linkloom/shared';
import { forbidden } from '../../common/app-error.js';

export interface TaskActor {
  id: string;
  role: Role;
}

/** Fields a writer may change on a task assigned to them; everything else needs an editor. */
const WRITER_FIELDS = new Set(['status']);

export function assertCanCreate(actor: TaskActor): void {
  if (!roleAtLeast(actor.role, 'editor')) throw forbidden('Only editors and admins create and assign fix tasks.');
}

export function assertCanUpdate(actor: TaskActor, task: { assigneeId: string | null }, fields: string[]): void {
  if (roleAtLeast(actor.role, 'editor')) return;
  if (actor.role !== 'writer') throw forbidden('Viewers can read tasks but not change them.');
  if (task.assigneeId !== actor.id) throw forbidden('Writers can only update tasks assigned to them.');
  const other = fields.filter((f) => !WRITER_FIELDS.has(f));
  if (other.length) throw forbidden(`Writers can change only the status of their tasks, not ${other.join(', ')}.`);
}

export function assertCanComment(actor: TaskActor, task: { assigneeId: string | null }): void {
  if (roleAtLeast(actor.role, 'editor')) return;
  if (actor.role === 'writer' && task.assigneeId === actor.id) return;
  throw forbidden(
    actor.role === 'writer' ? 'Writers can only comment on tasks assigned to them.' : 'Viewers can read tasks but not comment.',
  );
}

/** Only writers, editors and admins do documentation work, so only they can be assignees. */
export function canBeAssignee(role: Role): boolean {
  return roleAtLeast(role, 'writer');
}
