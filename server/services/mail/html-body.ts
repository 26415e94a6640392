/** One block of an HTML mail: a paragraph of text, or a link shown as its own line. */
export type MailBlock = string | { href: string; label: string };

const ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/** Text made safe inside HTML text and double-quoted attributes. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ESCAPES[c]);
}

/**
 * The HTML part of a mail: the same paragraphs and links as the plain text, every value escaped, in a
 * plain layout most mail programs show as written (inline styles only, no images, no scripts).
 */
export function htmlBody(subject: string, blocks: readonly MailBlock[]): string {
  const body = blocks
    .filter((block) => block !== '')
    .map((block) =>
      typeof block === 'string'
        ? `<p style="margin:0 0 16px">${escapeHtml(block)}</p>`
        : `<p style="margin:0 0 16px"><a href="${escapeHtml(block.href)}" style="color:#1f4e79;font-weight:600">${escapeHtml(block.label)}</a><br><span style="color:#555;font-size:13px">${escapeHtml(block.href)}</span></p>`,
    )
    .join('\n');
  return [
    '<!doctype html>',
    `<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(subject)}</title></head>`,
    '<body style="margin:0;padding:24px;background:#faf7f2;color:#1b2230;font-family:Helvetica,Arial,sans-serif;font-size:15px;line-height:1.5">',
    `<div style="max-width:560px">\n${body}\n</div>`,
    '</body></html>',
  ].join('\n');
}
