// "Pruning list waiting": sent to the people who decide on a doc set's pruning list when a run adds
// undecided candidates. The notifications module frames it and adds the unsubscribe link.
import { bulletList, button, paragraph } from '../mail/mail-layout.js';
import type { MailContent } from '../notifications/mail-composer.service.js';

const SHOWN = 20;

export function pruningWaitingContent(name: string, docSet: { id: string; name: string }, paths: string[], publicUrl: string): MailContent {
  const url = `${publicUrl}/doc-sets/${encodeURIComponent(docSet.id)}/pruning?status=undecided`;
  const shown = paths.slice(0, SHOWN);
  const more = paths.length > SHOWN ? [`...and ${paths.length - SHOWN} more`] : [];
  const intro = `The latest run proposed ${paths.length} page(s) of ${docSet.name} for pruning:`;
  const never = 'Linkloom never deletes pages; approved pages go to your own deletion process.';
  return {
    subject: `Pruning list waiting: ${paths.length} new page(s) to decide in ${docSet.name}`,
    title: 'Pages waiting for your decision',
    preheader: intro,
    text: [`Hello ${name},`, '', intro, ...shown.map((p) => `- ${p}`), ...more, '', `Decide: ${url}`, '', never],
    body: [
      paragraph(`Hello ${name},`),
      paragraph(intro),
      bulletList([...shown, ...more]),
      button('Open the pruning list', url),
      paragraph(never, true),
    ],
    reason: `you decide on the pruning list of ${docSet.name}`,
  };
}
