// The "you have been assigned" message. Text and HTML are built here; every value is escaped for HTML because
// titles and paths come from imported documents.
import type { NewOutboxMessage } from '../mail/outbox.repository.js';

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export interface AssignedTask {
  id: string;
  title: string;
  pagePath: string;
  dueDate: string | null;
}

export function assignmentMail(
  to: { email: string; name: string },
  tasks: AssignedTask[],
  docSet: { id: string; name: string },
  publicUrl: string,
): NewOutboxMessage {
  const link = (t: AssignedTask) => `${publicUrl}/tasks?task=${encodeURIComponent(t.id)}`;
  const subject =
    tasks.length === 1 ? `Task assigned to you: ${tasks[0].title}` : `${tasks.length} tasks assigned to you in ${docSet.name}`;
  const line = (t: AssignedTask) => `${t.title} (${t.pagePath})${t.dueDate ? `, due ${t.dueDate}` : ''}`;
  const text = [
    `Hello ${to.name},`,
    '',
    `You have new work in ${docSet.name}:`,
    ...tasks.map((t) => `- ${line(t)}: ${link(t)}`),
    '',
    `All your tasks: ${publicUrl}/tasks`,
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(to.name)},</p><p>You have new work in ${escapeHtml(docSet.name)}:</p><ul>`,
    ...tasks.map((t) => `<li><a href="${escapeHtml(link(t))}">${escapeHtml(line(t))}</a></li>`),
    `</ul><p><a href="${escapeHtml(`${publicUrl}/tasks`)}">All your tasks</a></p>`,
  ].join('');
  return { kind: 'task-assigned', toAddress: to.email, subject, text, html, docSetId: docSet.id };
}
