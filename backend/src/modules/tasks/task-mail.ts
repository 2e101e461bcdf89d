// The two mails about a person's own tasks: "assigned to you" and "reopened by a run". The composer of the
// notifications module frames them and adds the unsubscribe link; values are escaped by the layout helpers.
import type { TaskCheckItem } from '@linkloom/shared';
import { bulletList, button, link, paragraph } from '../mail/mail-layout.js';
import type { MailContent } from '../notifications/mail-composer.service.js';
import { describeItem } from './task-verification.js';

export interface AssignedTask {
  id: string;
  title: string;
  pagePath: string;
  dueDate: string | null;
}

export interface ReopenedTask {
  id: string;
  title: string;
  pagePath: string;
  runNumber: number | null;
  items: TaskCheckItem[];
}

const taskUrl = (publicUrl: string, id: string) => `${publicUrl}/tasks?task=${encodeURIComponent(id)}`;

export function assignmentContent(name: string, tasks: AssignedTask[], docSet: { name: string }, publicUrl: string): MailContent {
  const subject =
    tasks.length === 1 ? `Task assigned to you: ${tasks[0].title}` : `${tasks.length} tasks assigned to you in ${docSet.name}`;
  const line = (t: AssignedTask) => `${t.title} (${t.pagePath})${t.dueDate ? `, due ${t.dueDate}` : ''}`;
  return {
    subject,
    title: tasks.length === 1 ? 'A task for you' : `${tasks.length} tasks for you`,
    preheader: `New work in ${docSet.name}`,
    text: [
      `Hello ${name},`,
      '',
      `You have new work in ${docSet.name}:`,
      ...tasks.map((t) => `- ${line(t)}: ${taskUrl(publicUrl, t.id)}`),
      '',
      `All your tasks: ${publicUrl}/tasks`,
    ],
    body: [
      paragraph(`Hello ${name},`),
      paragraph(`You have new work in ${docSet.name}:`),
      bulletList(tasks.map((t) => link(line(t), taskUrl(publicUrl, t.id)))),
      button('Open your tasks', `${publicUrl}/tasks`),
    ],
    reason: 'tasks are assigned to you in Linkloom',
  };
}

export function reopenedContent(name: string, tasks: ReopenedTask[], docSet: { name: string }, publicUrl: string): MailContent {
  const first = tasks[0];
  const subject = tasks.length === 1 ? `Task reopened: ${first.title}` : `${tasks.length} of your tasks reopened in ${docSet.name}`;
  const found = (t: ReopenedTask) => t.items.filter((i) => i.stillFound).map(describeItem);
  const run = (t: ReopenedTask) => (t.runNumber ? `run ${t.runNumber}` : 'the latest run');
  return {
    subject,
    title: tasks.length === 1 ? 'A task of yours is open again' : `${tasks.length} tasks of yours are open again`,
    preheader: `A run of ${docSet.name} finds the problem again`,
    text: [
      `Hello ${name},`,
      '',
      `A run of ${docSet.name} finds again what these verified tasks had fixed:`,
      ...tasks.flatMap((t) => [
        `- ${t.title} (${t.pagePath}), reopened by ${run(t)}: ${taskUrl(publicUrl, t.id)}`,
        ...found(t).map((f) => `    still found: ${f}`),
      ]),
    ],
    body: [
      paragraph(`Hello ${name},`),
      paragraph(`A run of ${docSet.name} finds again what these verified tasks had fixed:`),
      ...tasks.flatMap((t) => [
        paragraph(`${t.title} (${t.pagePath}), reopened by ${run(t)}`),
        bulletList(found(t).map((f) => `still found: ${f}`)),
        link('Open the task', taskUrl(publicUrl, t.id)),
      ]),
      button('Open your tasks', `${publicUrl}/tasks`),
    ],
    reason: 'you are the assignee of these tasks',
  };
}
