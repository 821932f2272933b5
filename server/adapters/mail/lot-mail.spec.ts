import { lotMail } from './lot-mail';

const content = {
  to: 'buyer@example.test',
  subject: 'A question about your lot',
  greeting: 'Hello Ada,',
  lead: ['A buyer asked about your lot.'],
  lot: { title: 'Alfalfa <2nd> cutting', facts: [['RFV', '152'], ['Price', '$300/ton as-fed']] as [string, string][] },
  quote: { from: 'Sam', body: 'Can a semi reach the barn?\nThanks' },
  action: { label: 'Answer', url: 'http://127.0.0.1:4000/messages/3?x=1&y=2' },
  footer: 'You get this because you list hay on Baleproof.',
};

describe('lotMail', () => {
  it('sends the same facts in the text and the HTML part', () => {
    const mail = lotMail(content);
    for (const part of [mail.text, mail.html!]) {
      expect(part).toContain('RFV');
      expect(part).toContain('152');
      expect(part).toContain('$300/ton as-fed');
      expect(part).toContain('Can a semi reach the barn?');
    }
    expect(mail.text).toContain('Answer: http://127.0.0.1:4000/messages/3?x=1&y=2');
    expect(mail.text).toContain('> Thanks');
  });

  // OWASP XSS prevention, rule 1 (common practice): HTML-escape untrusted text placed in element content and attributes.
  it('escapes what users typed in the HTML part', () => {
    const html = lotMail({ ...content, quote: { from: 'Sam', body: '<script>alert(1)</script>' } }).html!;
    expect(html).not.toContain('<script>');
    expect(html).toContain('&lt;script&gt;');
    expect(html).toContain('Alfalfa &lt;2nd&gt; cutting');
    expect(html).toContain('href="http://127.0.0.1:4000/messages/3?x=1&amp;y=2"');
  });
});
