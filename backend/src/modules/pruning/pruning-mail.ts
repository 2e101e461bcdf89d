// "Pruning list waiting": sent to editors when a run adds undecided candidates. Values are HTML-escaped
// because paths come from imported documents.
import type { NewOutboxMessage } from '../mail/outbox.repository.js';

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const SHOWN = 20;

export function pruningWaitingMail(
  to: { email: string; name: string },
  docSet: { id: string; name: string },
  paths: string[],
  publicUrl: string,
): NewOutboxMessage {
  const url = `${publicUrl}/doc-sets/${encodeURIComponent(docSet.id)}/pruning?status=undecided`;
  const more = paths.length > SHOWN ? [`...and ${paths.length - SHOWN} more`] : [];
  const subject = `Pruning list waiting: ${paths.length} new page(s) to decide in ${docSet.name}`;
  const text = [
    `Hello ${to.name},`,
    '',
    `The latest run proposed ${paths.length} page(s) of ${docSet.name} for pruning:`,
    ...paths.slice(0, SHOWN).map((p) => `- ${p}`),
    ...more,
    '',
    `Decide: ${url}`,
    '',
    'Linkloom never deletes pages; approved pages go to your own deletion process.',
  ].join('\n');
  const html = `<p>Hello ${escapeHtml(to.name)},</p><p>The latest run proposed ${paths.length} page(s) of ${escapeHtml(docSet.name)} for pruning:</p><ul>${paths
    .slice(0, SHOWN)
    .map((p) => `<li>${escapeHtml(p)}</li>`)
    .join(
      '',
    )}${more.map((m) => `<li>${escapeHtml(m)}</li>`).join('')}</ul><p><a href="${escapeHtml(url)}">Open the pruning list</a></p><p>Linkloom never deletes pages; approved pages go to your own deletion process.</p>`;
  return { kind: 'pruning-waiting', toAddress: to.email, subject, text, html, docSetId: docSet.id };
}
