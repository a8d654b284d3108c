import type { OutgoingEmail } from './outbox.service';

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A plain message with one call to action; text and HTML say the same. */
export function actionEmail(opts: {
  to: string;
  kind: string;
  subject: string;
  greeting: string;
  lines: string[];
  actionLabel?: string;
  actionUrl?: string;
  footer?: string;
  /** A second, quieter link under the footer (e.g. to stop a recurring e-mail). */
  footerLink?: { label: string; url: string };
}): OutgoingEmail {
  const text = [
    opts.greeting,
    '',
    ...opts.lines,
    ...(opts.actionUrl ? ['', `${opts.actionLabel ?? 'Open'}: ${opts.actionUrl}`] : []),
    '',
    opts.footer ?? 'If you did not expect this e-mail, you can ignore it.',
    ...(opts.footerLink ? [`${opts.footerLink.label}: ${opts.footerLink.url}`] : []),
    '— Rodewise',
  ].join('\n');
  const html = `<div style="font-family:sans-serif;max-width:560px;line-height:1.5">
<p>${esc(opts.greeting)}</p>${opts.lines.map((l) => `<p>${esc(l)}</p>`).join('')}
${opts.actionUrl ? `<p><a href="${esc(opts.actionUrl)}" style="background:#c2410c;color:#fff;padding:10px 16px;border-radius:6px;text-decoration:none">${esc(opts.actionLabel ?? 'Open')}</a></p><p style="font-size:13px;color:#555">Or paste this link: ${esc(opts.actionUrl)}</p>` : ''}
<p style="font-size:13px;color:#555">${esc(opts.footer ?? 'If you did not expect this e-mail, you can ignore it.')}</p>${opts.footerLink ? `<p style="font-size:13px"><a href="${esc(opts.footerLink.url)}">${esc(opts.footerLink.label)}</a></p>` : ''}<p>— Rodewise</p></div>`;
  return { to: opts.to, kind: opts.kind, subject: opts.subject, text, html };
}
