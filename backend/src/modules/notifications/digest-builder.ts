import { escapeHtml } from '../mail/mail-address.js';

export interface DigestChange {
  label: string;
  appeared: string[];
  appearedTotal: number;
  disappeared: string[];
  disappearedTotal: number;
}

export interface DigestInput {
  docSetName: string;
  runUrl: string;
  finishedAt: string;
  pageCount: number;
  changes: DigestChange[];
  scoreMoves: { path: string; before: number; after: number }[];
  tasksVerified: string[];
  tasksOverdue: string[];
  pruningWaiting: number;
}

export interface DigestMail {
  subject: string;
  text: string;
  html: string;
  nothingChanged: boolean;
}

const LIST_LIMIT = 10;

function sign(n: number): string {
  return n > 0 ? `+${n}` : String(n);
}

/** Turns what changed in a nightly run into one e-mail, plain text and HTML carrying the same numbers. */
export function buildDigest(input: DigestInput): DigestMail {
  const changed = input.changes.filter((c) => c.appearedTotal + c.disappearedTotal > 0);
  const nothingChanged = changed.length === 0 && input.tasksVerified.length === 0 && input.scoreMoves.length === 0;
  const headline = changed.map((c) => `${c.label} ${sign(c.appearedTotal - c.disappearedTotal)}`).join(', ');
  const subject = `Linkloom nightly: ${input.docSetName} — ${nothingChanged ? 'nothing changed' : headline || 'scores moved'}`;

  const text: string[] = [
    `Nightly run of ${input.docSetName} (${input.pageCount} pages), finished ${input.finishedAt}.`,
    `Open it: ${input.runUrl}`,
    '',
  ];
  const html: string[] = [
    `<h2>${escapeHtml(input.docSetName)}: nightly run</h2>`,
    `<p>${input.pageCount} pages, finished ${escapeHtml(input.finishedAt)}. <a href="${escapeHtml(input.runUrl)}">Open the run in Linkloom</a>.</p>`,
  ];
  if (nothingChanged) {
    text.push('Nothing changed since the previous run.');
    html.push('<p>Nothing changed since the previous run.</p>');
  }
  for (const change of changed) {
    text.push(`${change.label}: ${change.appearedTotal} new, ${change.disappearedTotal} gone`);
    html.push(`<h3>${escapeHtml(change.label)}: ${change.appearedTotal} new, ${change.disappearedTotal} gone</h3>`);
    for (const [word, items, total] of [
      ['new', change.appeared, change.appearedTotal],
      ['gone', change.disappeared, change.disappearedTotal],
    ] as const) {
      if (total === 0) continue;
      const shown = items.slice(0, LIST_LIMIT);
      const more = total > shown.length ? ` and ${total - shown.length} more` : '';
      text.push(...shown.map((item) => `  ${word}: ${item}`), ...(more ? [`  ${more.trim()}`] : []));
      html.push(
        `<p>${word}:</p><ul>${shown.map((item) => `<li>${escapeHtml(item)}</li>`).join('')}${more ? `<li>${escapeHtml(more.trim())}</li>` : ''}</ul>`,
      );
    }
  }
  if (input.scoreMoves.length) {
    text.push('', 'Largest score moves (times the average):');
    text.push(...input.scoreMoves.map((m) => `  ${m.path}: ${m.before.toFixed(2)} -> ${m.after.toFixed(2)}`));
    html.push(
      '<h3>Largest score moves (times the average)</h3><ul>',
      ...input.scoreMoves.map((m) => `<li>${escapeHtml(m.path)}: ${m.before.toFixed(2)} → ${m.after.toFixed(2)}</li>`),
      '</ul>',
    );
  }
  const work: [string, string[]][] = [
    ['Tasks verified by this run', input.tasksVerified],
    ['Tasks overdue', input.tasksOverdue],
  ];
  for (const [label, items] of work) {
    if (items.length === 0) continue;
    text.push('', `${label}: ${items.length}`, ...items.slice(0, LIST_LIMIT).map((i) => `  ${i}`));
    html.push(
      `<h3>${label}: ${items.length}</h3><ul>${items
        .slice(0, LIST_LIMIT)
        .map((i) => `<li>${escapeHtml(i)}</li>`)
        .join('')}</ul>`,
    );
  }
  if (input.pruningWaiting > 0) {
    text.push('', `Pruning decisions waiting: ${input.pruningWaiting}`);
    html.push(`<p>Pruning decisions waiting: ${input.pruningWaiting}</p>`);
  }
  text.push('', 'You get this because you follow this doc set; change it under Account in Linkloom.');
  html.push('<p style="color:#666">You get this because you follow this doc set; change it under Account in Linkloom.</p>');
  return { subject, text: text.join('\n'), html: html.join('\n'), nothingChanged };
}
