// A fix task as the tasks API answers it, typed from and parsed by the shared schema.
import { taskItemSchema, type TaskItem } from '@linkloom/shared';
import { parsed } from '../../testing/fixtures.js';

export function task(id: string, overrides: Partial<TaskItem> = {}): TaskItem {
  return parsed(taskItemSchema, {
    id,
    docSetId: 'd1',
    docSetName: 'Handbook',
    pagePath: 'index.md',
    kind: 'add-inbound-links',
    title: 'Link to this page',
    details: '',
    finding: {},
    assignee: null,
    priority: 'normal',
    dueDate: null,
    overdue: false,
    status: 'open',
    verification: null,
    verifiedAt: null,
    createdAt: '2026-11-30T09:00:00Z',
    updatedAt: '2026-11-30T09:00:00Z',
    ...overrides,
  });
}
