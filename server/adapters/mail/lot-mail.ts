import type { OutgoingMail } from './mailer';

/** One e-mail about a lot: a greeting, what happened, the lot's facts, one link, and why it was sent. */
export interface LotMailContent {
  to: string;
  subject: string;
  greeting: string;
  /** Paragraphs saying what happened, in plain text. */
  lead: string[];
  lot: { title: string; facts: [label: string, value: string][] };
  /** A quoted message, shown set apart (e.g. a buyer's question). */
  quote?: { from: string; body: string };
  action: { label: string; url: string };
  /** Why this e-mail came and how to stop it. */
  footer: string;
}

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/**
 * The same content as plain text and as simple HTML (inline styles only, a single 560 px column, system fonts),
 * in Baleproof's ink and oat colours. Every value is escaped; the text part reads well on its own.
 */
export function lotMail(content: LotMailContent): OutgoingMail {
  const facts = content.lot.facts;
  const text = [
    content.greeting,
    '',
    ...content.lead.flatMap((p) => [p, '']),
    ...(content.quote ? [`${content.quote.from} wrote:`, ...content.quote.body.split('\n').map((l) => `> ${l}`), ''] : []),
    content.lot.title,
    ...facts.map(([label, value]) => `  ${label}: ${value}`),
    '',
    `${content.action.label}: ${content.action.url}`,
    '',
    '— Baleproof',
    content.footer,
  ].join('\n');

  const ink = '#1d2340';
  const html = `<!doctype html><html><body style="margin:0;background:#f6f1e6;color:${ink};font-family:system-ui,-apple-system,'Segoe UI',sans-serif;font-size:16px;line-height:1.45">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:24px 12px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" style="max-width:560px;width:100%;background:#fffdf7;border:1.5px solid ${ink}">
<tr><td style="padding:14px 20px;border-bottom:2px solid ${ink};font-weight:700;font-size:18px">Baleproof</td></tr>
<tr><td style="padding:16px 20px">
<p style="margin:0 0 12px">${escape(content.greeting)}</p>
${content.lead.map((p) => `<p style="margin:0 0 12px">${escape(p)}</p>`).join('\n')}
${content.quote ? `<p style="margin:0 0 4px;color:#5d5547">${escape(content.quote.from)} wrote:</p><blockquote style="margin:0 0 16px;padding:8px 12px;border-left:4px solid #9a4a22;background:#f6f1e6;white-space:pre-wrap">${escape(content.quote.body)}</blockquote>` : ''}
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="border-top:1.5px solid ${ink};margin:8px 0 16px">
<tr><td colspan="2" style="padding:8px 0 4px;font-weight:700">${escape(content.lot.title)}</td></tr>
${facts.map(([label, value]) => `<tr><td style="padding:3px 12px 3px 0;border-bottom:1px solid #d8cfbd;color:#5d5547;font-size:13px;text-transform:uppercase;letter-spacing:.05em">${escape(label)}</td><td style="padding:3px 0;border-bottom:1px solid #d8cfbd;font-variant-numeric:tabular-nums">${escape(value)}</td></tr>`).join('\n')}
</table>
<p style="margin:0 0 8px"><a href="${escape(content.action.url)}" style="display:inline-block;padding:8px 14px;background:${ink};color:#fffdf7;text-decoration:none;font-weight:700;border-radius:3px">${escape(content.action.label)}</a></p>
</td></tr>
<tr><td style="padding:10px 20px;border-top:1px solid #d8cfbd;font-size:13px;color:#5d5547">${escape(content.footer)}</td></tr>
</table></td></tr></table></body></html>`;

  return { to: content.to, subject: content.subject, text, html };
}
