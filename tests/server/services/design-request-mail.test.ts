import nodemailer from 'nodemailer';
import { simpleParser } from 'mailparser';
import { describe, expect, it } from 'vitest';
import { requestNewsMail, requestSentMail } from '@/server/services/mail/design-request-mail';
import { escapeHtml } from '@/server/services/mail/html-body';

const hrefs = (html: string) => [...html.matchAll(/href="([^"]*)"/g)].map((m) => m[1]);
const links = (text: string) => text.match(/https?:\/\/\S+/g) ?? [];
const decode = (value: string) => value.replace(/&amp;/g, '&');

const sent = (firmName: string, invitation = false) =>
  requestSentMail({
    to: 'engineer@example.test',
    firmName,
    contractorName: 'Dana <Lead>',
    number: 4,
    version: 2,
    jobName: 'Kitchen & dining "opening"',
    link: 'http://app.test/request-invite/abc?x=1&y=2',
    invitation,
  });

describe('design request mail: plain text kept, an HTML part beside it', () => {
  it('escapes every value the firm or contractor typed, in text and attributes', () => {
    const mail = sent('<script>alert(1)</script> Framing');
    expect(mail.html).toBeDefined();
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('&lt;script&gt;alert(1)&lt;/script&gt; Framing');
    expect(mail.html).toContain('Dana &lt;Lead&gt;');
    expect(mail.html).toContain('Kitchen &amp; dining &quot;opening&quot;');
    expect(mail.text).toContain('<script>alert(1)</script> Framing');
    expect(escapeHtml(`a"b'c<d>&`)).toBe('a&quot;b&#39;c&lt;d&gt;&amp;');
  });

  it('carries the same links as the plain text, in the anchor and written out', () => {
    for (const mail of [
      sent('Sample Remodeling', true),
      sent('Sample Remodeling'),
      requestNewsMail({
        to: 'firm@example.test',
        number: 4,
        jobName: 'Kitchen',
        news: 'now Designed',
        link: 'http://app.test/requests/r1',
      }),
    ]) {
      const html = mail.html!;
      expect(hrefs(html).map(decode)).toEqual(links(mail.text));
      expect(html).toContain(`>${escapeHtml(links(mail.text)[0] ?? '')}</span>`);
    }
    expect(sent('Sample Remodeling', true).html).toContain('The link works once and for 30 days.');
  });

  it('goes out as multipart/alternative with both parts (nodemailer, read back with mailparser)', async () => {
    const mail = sent('Sample Remodeling', true);
    const transport = nodemailer.createTransport({ streamTransport: true, buffer: true });
    const info = await transport.sendMail({ from: 'test@tributary.test', ...mail });
    const raw = (info.message as Buffer).toString('utf8');
    expect(raw).toMatch(/Content-Type: multipart\/alternative/);
    const parsed = await simpleParser(raw);
    expect(parsed.text?.trim()).toBe(mail.text);
    expect(parsed.html).toBe(mail.html);
  });
});
