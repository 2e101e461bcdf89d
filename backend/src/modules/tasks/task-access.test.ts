import { describe, expect, it } from 'vitest';
import { AppError } from '../../common/app-error.js';
import { assertCanComment, assertCanCreate, assertCanUpdate } from './task-access.js';

const status = (fn: () => void): number | 'ok' => {
  try {
    fn();
    return 'ok';
  } catch (error) {
    return (error as AppError).status;
  }
};
const mine = { assigneeId: 'w1' };
const theirs = { assigneeId: 'w2' };

describe('task access rules (docs/threats.md checks 56, 57 and 60)', () => {
  it('lets only editors and admins create', () => {
    expect(status(() => assertCanCreate({ id: 'a', role: 'admin' }))).toBe('ok');
    expect(status(() => assertCanCreate({ id: 'e', role: 'editor' }))).toBe('ok');
    expect(status(() => assertCanCreate({ id: 'w1', role: 'writer' }))).toBe(403);
    expect(status(() => assertCanCreate({ id: 'v', role: 'viewer' }))).toBe(403);
  });

  it('lets a writer change only the status of their own task', () => {
    const writer = { id: 'w1', role: 'writer' as const };
    expect(status(() => assertCanUpdate(writer, mine, ['status']))).toBe('ok');
    expect(status(() => assertCanUpdate(writer, mine, ['assigneeId']))).toBe(403);
    expect(status(() => assertCanUpdate(writer, mine, ['status', 'dueDate']))).toBe(403);
    expect(status(() => assertCanUpdate(writer, theirs, ['status']))).toBe(403);
    expect(status(() => assertCanUpdate({ id: 'v', role: 'viewer' }, mine, ['status']))).toBe(403);
    expect(status(() => assertCanUpdate({ id: 'e', role: 'editor' }, theirs, ['assigneeId', 'status']))).toBe('ok');
  });

  it('lets writers comment on their own tasks only, viewers never', () => {
    expect(status(() => assertCanComment({ id: 'w1', role: 'writer' }, mine))).toBe('ok');
    expect(status(() => assertCanComment({ id: 'w1', role: 'writer' }, theirs))).toBe(403);
    expect(status(() => assertCanComment({ id: 'v', role: 'viewer' }, mine))).toBe(403);
  });
});
