// Every message is a short plain-text and HTML pair with one link into the app.
import type { OutgoingMail } from './mailer';

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** Builds a message from paragraphs and one call-to-action link. */
export function composeMail(opts: {
  to: string | string[];
  subject: string;
  paragraphs: string[];
  link: { label: string; url: string };
}): OutgoingMail {
  const text = [...opts.paragraphs, '', `${opts.link.label}: ${opts.link.url}`, '', '-- Bootwright'].join('\n');
  const html = [
    '<div style="font-family:sans-serif;font-size:15px;line-height:1.5;color:#1c2b33">',
    ...opts.paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    `<p><a href="${escapeHtml(opts.link.url)}">${escapeHtml(opts.link.label)}</a></p>`,
    '<p style="color:#55636b">Bootwright</p>',
    '</div>',
  ].join('\n');
  return { to: opts.to, subject: opts.subject, text, html };
}
