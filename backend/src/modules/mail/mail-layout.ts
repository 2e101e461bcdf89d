// The look of every Linkloom e-mail: one centred table, inline styles only and no remote images, fonts or
// style sheets, because mail clients drop <style> blocks and block remote content (common practice). Every
// helper escapes what it is given; only `html` strings made by these helpers are passed through as they are.
import { escapeHtml } from './mail-address.js';

const INK = '#123F4A';
const SAFFRON = '#E8893A';
const TEXT = '#1C2629';
const MUTED = '#4F5F63';
const LINEN = '#F2EFE8';
const FONT = "font-family:Roboto,'Segoe UI',Helvetica,Arial,sans-serif";

/** A piece of HTML made by the helpers below (already escaped). */
export interface Html {
  readonly html: string;
}

const raw = (html: string): Html => ({ html });

export function paragraph(text: string, muted = false): Html {
  return raw(`<p style="margin:0 0 12px;${FONT};font-size:14px;line-height:20px;color:${muted ? MUTED : TEXT}">${escapeHtml(text)}</p>`);
}

/** Small grey print (footers): the parts joined with " · ". */
export function smallPrint(parts: (string | Html)[]): Html {
  const body = parts.map((p) => (typeof p === 'string' ? escapeHtml(p) : p.html)).join(' · ');
  return raw(`<p style="margin:0 0 6px;${FONT};font-size:12px;line-height:18px;color:${MUTED}">${body}</p>`);
}

export function heading(text: string): Html {
  return raw(`<h2 style="margin:20px 0 8px;${FONT};font-size:16px;line-height:22px;font-weight:600;color:${INK}">${escapeHtml(text)}</h2>`);
}

export function link(label: string, url: string): Html {
  return raw(`<a href="${escapeHtml(url)}" style="color:${INK};text-decoration:underline">${escapeHtml(label)}</a>`);
}

export function button(label: string, url: string): Html {
  return raw(
    `<table role="presentation" cellpadding="0" cellspacing="0" style="margin:8px 0 16px"><tr><td style="background:${SAFFRON};border-radius:6px">` +
      `<a href="${escapeHtml(url)}" style="display:inline-block;padding:10px 18px;${FONT};font-size:14px;font-weight:600;color:#1B1208;text-decoration:none">${escapeHtml(label)}</a>` +
      '</td></tr></table>',
  );
}

export function bulletList(items: (string | Html)[]): Html {
  const cells = items.map((i) => `<li style="margin:0 0 4px">${typeof i === 'string' ? escapeHtml(i) : i.html}</li>`).join('');
  return raw(`<ul style="margin:0 0 12px;padding-left:20px;${FONT};font-size:14px;line-height:20px;color:${TEXT}">${cells}</ul>`);
}

export type Cell = string | number | Html;

/** A data table; columns of numbers are right-aligned, heading included, so counts read at a glance. */
export function dataTable(headers: string[], rows: Cell[][]): Html {
  const numeric = headers.map((_, i) => rows.length > 0 && rows.every((r) => typeof r[i] === 'number'));
  const cell = (c: Cell, column: number, tag: 'td' | 'th') => {
    const body = typeof c === 'object' ? c.html : escapeHtml(String(c));
    const shade = tag === 'th' ? `background:${LINEN};font-weight:600;` : '';
    const align = numeric[column] ? 'right' : 'left';
    return `<${tag} style="${shade}padding:6px 10px;border-bottom:1px solid #E3DED3;text-align:${align};${FONT};font-size:13px;line-height:18px;color:${TEXT}">${body}</${tag}>`;
  };
  const head = `<tr>${headers.map((h, i) => cell(h, i, 'th')).join('')}</tr>`;
  const body = rows.map((r) => `<tr>${r.map((c, i) => cell(c, i, 'td')).join('')}</tr>`).join('');
  return raw(
    `<table role="presentation" cellpadding="0" cellspacing="0" width="100%" style="border-collapse:collapse;margin:0 0 12px">${head}${body}</table>`,
  );
}

export interface MailPage {
  /** The headline inside the mail. */
  title: string;
  /** The line a mail client shows beside the subject; hidden in the body. */
  preheader: string;
  body: Html[];
  footer: Html[];
}

/** A whole HTML document for the `text/html` part. */
export function renderMailPage(page: MailPage): string {
  return [
    '<!DOCTYPE html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width">',
    `<title>${escapeHtml(page.title)}</title></head>`,
    `<body style="margin:0;padding:0;background:${LINEN}">`,
    `<div style="display:none;max-height:0;overflow:hidden">${escapeHtml(page.preheader)}</div>`,
    `<table role="presentation" cellpadding="0" cellspacing="0" width="100%" style="background:${LINEN}"><tr><td align="center" style="padding:24px 12px">`,
    '<table role="presentation" cellpadding="0" cellspacing="0" width="640" style="max-width:640px;width:100%;background:#FFFFFF;border-radius:10px">',
    `<tr><td style="background:${INK};border-radius:10px 10px 0 0;padding:14px 24px;${FONT};font-size:15px;font-weight:600;color:#FFFFFF">Linkloom</td></tr>`,
    `<tr><td style="padding:20px 24px 8px"><h1 style="margin:0 0 12px;${FONT};font-size:20px;line-height:26px;font-weight:500;color:${TEXT}">${escapeHtml(page.title)}</h1>`,
    ...page.body.map((b) => b.html),
    '</td></tr>',
    `<tr><td style="padding:12px 24px 20px;border-top:1px solid #E3DED3">${page.footer.map((f) => f.html).join('')}</td></tr>`,
    '</table></td></tr></table></body></html>',
  ].join('\n');
}
